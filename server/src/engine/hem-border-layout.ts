import type { BorderFit } from './fit-border.ts';

/** The hem zone of a garment size, mm on its mockup. */
export interface HemZone {
  xMm: number;
  yMm: number;
  widthMm: number;
  heightMm: number;
}

/** The strip of the hem the border runs along, mm on the mockup: repeats past its ends are round the back. */
export interface BorderBand {
  leftMm: number;
  widthMm: number;
  centerYMm: number;
  heightMm: number;
}

/** One repeat as it shows on the front of the mockup, mm. */
export interface BorderRepeat {
  centerXMm: number;
  centerYMm: number;
  widthMm: number;
  heightMm: number;
}

/**
 * Where a fitted border's repeats show on the front of the mockup, mm: the run is centred on the hem zone and its
 * centre line sits `hemOffsetMm` above the hem edge (the zone's bottom). A closed loop is unrolled from the back
 * seam, so the front panel is its middle stretch, and only the repeats that reach the front are returned. The
 * designer draws these repeats and the studio's proof renders them, so both show the one layout.
 */
export function layoutHemBorder(input: {
  zone: HemZone;
  fit: BorderFit;
  isClosed: boolean;
  runLengthMm: number;
  hemFrontMm: number;
  hemOffsetMm: number;
  motifHeightMm: number;
}): { band: BorderBand; repeats: BorderRepeat[] } {
  const { zone, fit, isClosed, runLengthMm, hemFrontMm: frontMm } = input;
  const middleXMm = zone.xMm + zone.widthMm / 2;
  const heightMm = input.motifHeightMm * fit.scale;
  const centerYMm = zone.yMm + zone.heightMm - input.hemOffsetMm;
  const frontStartMm = isClosed ? (runLengthMm - frontMm) / 2 : 0;
  const repeats = fit.centersMm
    .map((runMm) => ({ centerXMm: middleXMm - frontMm / 2 + (runMm - frontStartMm), centerYMm, widthMm: fit.repeatWidthMm, heightMm }))
    .filter((repeat) => Math.abs(repeat.centerXMm - middleXMm) < (frontMm + repeat.widthMm) / 2);
  return { band: { leftMm: middleXMm - frontMm / 2, widthMm: frontMm, centerYMm, heightMm }, repeats };
}
