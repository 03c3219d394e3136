import type { HoopSummary } from '@server/contracts/catalogue.ts';
import type { ExtentMm } from './design-setting.ts';
import { largestScaleInField } from '@server/engine/hoop-fit.ts';

/**
 * How many times larger an item of this upright size may be made and still go in one hooping: the largest factor
 * at which some hoop's sewing field holds it, either way round (the server checks the same, unturned). Infinity
 * while the hoops are not known, so nothing is limited by a list that has not arrived.
 */
export function largestFactorInHoops(extent: ExtentMm, hoops: readonly HoopSummary[]): number {
  if (hoops.length === 0 || !(extent.widthMm > 0) || !(extent.heightMm > 0)) return Number.POSITIVE_INFINITY;
  return Math.max(...hoops.map((hoop) => largestScaleInField(hoop, extent)));
}

/** The hoop with the largest sewing field, for saying what the limit is. */
export const largestHoop = (hoops: readonly HoopSummary[]) =>
  hoops.reduce<HoopSummary | undefined>(
    (largest, hoop) =>
      !largest || hoop.fieldWidthMm * hoop.fieldHeightMm > largest.fieldWidthMm * largest.fieldHeightMm
        ? hoop
        : largest,
    undefined,
  );
