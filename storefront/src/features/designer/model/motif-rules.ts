import type { HoopSummary, MotifSummary } from '@server/contracts/catalogue.ts';
import { largestFactorInHoops } from './hoop-limit.ts';

/**
 * The sizes a single motif may be stitched at, whole per cent: its stitch file only resizes within narrow limits,
 * and it must still go in the largest hoop. `isHoopLimited` says the hoop, not the file, sets the top.
 */
export function motifScaleRange(
  motif: MotifSummary,
  hoops: readonly HoopSummary[],
): { minPct: number; maxPct: number; isHoopLimited: boolean } {
  const hoopMaxPct = Math.floor(
    largestFactorInHoops({ widthMm: motif.widthMm, heightMm: motif.heightMm }, hoops) * 100,
  );
  const maxPct = Math.max(motif.minScalePct, Math.min(motif.maxScalePct, hoopMaxPct));
  return { minPct: motif.minScalePct, maxPct, isHoopLimited: hoopMaxPct < motif.maxScalePct };
}

export function clampMotifScale(motif: MotifSummary, scalePct: number, hoops: readonly HoopSummary[]): number {
  const { minPct, maxPct } = motifScaleRange(motif, hoops);
  return Math.min(Math.max(Math.round(scalePct), minPct), maxPct);
}
