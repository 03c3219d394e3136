import type { GarmentSummary, MotifSummary } from '@server/contracts/catalogue.ts';
// Straight from its module: the engine's entry also registers colour spaces at load, which the catalogue does not need.
import { fitMotifBorder } from '@server/engine/fit-border.ts';

const HEM_ZONE = 'hem';

/**
 * Whether a motif can go on a garment in at least one of its sizes: a border when whole repeats meet all the way
 * round some size's hem within the motif's resizing limits (the engine's fit, the same one the server prices), a
 * single motif when it fits inside one of the garment's other places at its smallest allowed size.
 */
export function motifSuitsGarment(motif: MotifSummary, garment: GarmentSummary): boolean {
  if (motif.kind === 'border') {
    return garment.sizes.some(
      (size) =>
        size.hemCircumferenceMm !== null &&
        fitMotifBorder(motif, { runLengthMm: size.hemCircumferenceMm, closed: true }).ok,
    );
  }
  const smallest = motif.minScalePct / 100;
  return garment.sizes.some((size) =>
    size.zones.some(
      (zone) =>
        zone.code !== HEM_ZONE &&
        motif.widthMm * smallest <= zone.widthMm &&
        motif.heightMm * smallest <= zone.heightMm,
    ),
  );
}

/** Whether a garment takes lettering: it has a place other than the hem for a name. */
export const garmentTakesLettering = (garment: GarmentSummary) =>
  garment.sizes.some((size) => size.zones.some((zone) => zone.code !== HEM_ZONE));
