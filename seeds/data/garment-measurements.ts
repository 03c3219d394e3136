/**
 * The catalogue's back drawings and size measurements, kept beside garments.ts. The measurements are the
 * garment's own (chest all the way round, length from the shoulder), invented for the demo studio but in line with
 * children's sizing: common practice, no source. A bonnet has neither; a bib has only its length.
 */

/** File in seeds/garments/ drawn from the back, on the same viewBox as the front. */
export const backMockupFiles: Record<string, string> = {
  'smocked-yoke-dress': 'smocked-yoke-dress-back.svg',
  'bubble-romper': 'bubble-romper-back.svg',
  'bishop-dress': 'bishop-dress-back.svg',
  'terry-bib': 'bib-back.svg',
  'sun-bonnet': 'sun-bonnet-back.svg',
};

export interface SizeMeasurements {
  chestMm: number | null;
  lengthMm: number | null;
}

const measured = (chestMm: number | null, lengthMm: number | null): SizeMeasurements => ({ chestMm, lengthMm });

/** By garment size id (seeds/data/garments.ts). */
export const sizeMeasurements: Record<number, SizeMeasurements> = {
  101: measured(470, 410),
  102: measured(490, 440),
  103: measured(510, 470),
  104: measured(530, 500),
  105: measured(550, 540),
  106: measured(570, 580),
  201: measured(460, 360),
  202: measured(480, 390),
  203: measured(500, 410),
  204: measured(520, 430),
  301: measured(470, 400),
  302: measured(490, 430),
  303: measured(510, 460),
  304: measured(530, 490),
  305: measured(550, 520),
  // The bib drawing is 282 mm from neck binding to hem at medium; the other sizes are that drawing scaled.
  401: measured(null, 248),
  402: measured(null, 282),
  403: measured(null, 310),
  404: measured(null, 338),
};
