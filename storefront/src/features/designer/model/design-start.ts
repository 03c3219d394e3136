import type { GarmentSummary } from '@server/contracts/catalogue.ts';

/**
 * The size and fabric colour picked on the garment's page, handed to the designer in the navigation's state (not
 * the address, which stays free of catalogue numbers).
 */
export interface DesignStart {
  sizeId?: number;
  colourId?: number;
}

/** The picks from a navigation's state that are this garment's own; anything else is ignored. */
export function designStartOf(state: unknown, garment: GarmentSummary): { sizeId: number; colourId: number } {
  const start = (typeof state === 'object' && state !== null ? state : {}) as DesignStart;
  const size = garment.sizes.find((candidate) => candidate.id === start.sizeId) ?? garment.sizes[0]!;
  const colour = garment.colours.find((candidate) => candidate.id === start.colourId) ?? garment.colours[0]!;
  return { sizeId: size.id, colourId: colour.id };
}
