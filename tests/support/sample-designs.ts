import type { DesignPlacement } from '../../server/src/contracts/designs.ts';
import type { QuotePreviewRequest } from '../../server/src/contracts/quotes.ts';
import { garments } from '../../seeds/data/garments.ts';
import { motifs } from '../../seeds/data/motifs.ts';

const bishop = garments.find((garment) => garment.slug === 'bishop-dress')!;
const daisy = motifs.find((motif) => motif.slug === 'daisy-chain')!;

/** A seeded bishop dress, smallest size, with a daisy chain round the hem: a quote any test can ask for. */
export const daisyDressQuote: QuotePreviewRequest = {
  garmentId: bishop.id,
  sizeId: bishop.sizes[0].id,
  colourId: bishop.colours[0].id,
  quantity: 1,
  isRush: false,
  document: {
    version: 1,
    placements: [
      {
        id: 'hem',
        kind: 'border',
        zone: 'hem',
        motif: 'daisy-chain',
        run: 'circumference',
        hemOffsetMm: 44.45,
        threads: daisy.threadCodes,
      },
    ],
  },
};

const sixMonths = bishop.sizes.find((size) => size.code === '6m')!;

/** A seeded bishop dress, 6 months, with one artwork upload on the chest at a width: a quote of customer artwork. */
export const artworkDressQuote = (artworkUploadId: number, widthMm: number): QuotePreviewRequest => ({
  garmentId: bishop.id,
  sizeId: sixMonths.id,
  colourId: bishop.colours[0].id,
  quantity: 1,
  isRush: false,
  document: {
    version: 1,
    placements: [
      {
        id: 'drawing',
        kind: 'artwork',
        zone: 'chest',
        centerXMm: 209,
        centerYMm: 105,
        rotationDeg: 0,
        artworkUploadId,
        widthMm,
      } satisfies DesignPlacement,
    ],
  },
});

/** A name on the chest of the bishop dress (its chest zone's middle), sewn in one thread. */
export const chestLettering = (text: string, font: string, letterHeightMm: number): DesignPlacement => ({
  id: 'name',
  kind: 'lettering',
  zone: 'chest',
  centerXMm: 209,
  centerYMm: 105,
  rotationDeg: 0,
  text,
  font,
  letterHeightMm,
  thread: 'WB-110',
});
