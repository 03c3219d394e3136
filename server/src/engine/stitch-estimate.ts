import type { Extent } from './outline-geometry.ts';
import { EMPTY_TALLY, addTallies, tallyTotal, type StitchTally } from './shape-stitches.ts';

/** What a design costs to sew, in stitches and stops. */
export interface StitchEstimate {
  /** All stitches, underlay included. */
  stitches: number;
  colorChanges: number;
  /** Thread cuts between separate objects of one colour (an upper bound: digitizers often travel instead). */
  trims: number;
  byType: StitchTally;
  /** Stitched width and height, mm. */
  widthMm: number;
  heightMm: number;
  /** Things the estimate could not account for, in words (skipped elements, unreadable path data). */
  notes: string[];
}

/** One separately stitched object, in stitching order. */
export interface StitchedPart {
  /** Thread colour key; consecutive parts with the same key are sewn without a colour change. */
  color: string;
  tally: StitchTally;
}

/**
 * Adds up parts in stitching order: each run of one colour is a colour block, blocks after the first are colour
 * changes, and each further object inside a block needs a trim (common practice, no source).
 */
export function summariseParts(
  parts: readonly StitchedPart[],
  extent: Extent | undefined,
  notes: string[],
): StitchEstimate {
  let byType: StitchTally = { ...EMPTY_TALLY };
  let blocks = 0;
  let previous: string | undefined;
  for (const part of parts) {
    byType = addTallies(byType, part.tally);
    if (part.color !== previous) blocks += 1;
    previous = part.color;
  }
  return {
    stitches: tallyTotal(byType),
    colorChanges: Math.max(0, blocks - 1),
    trims: parts.length - blocks,
    byType,
    widthMm: extent ? extent.maxX - extent.minX : 0,
    heightMm: extent ? extent.maxY - extent.minY : 0,
    notes,
  };
}
