import { fail, type EngineResult } from './engine-result.ts';
import { isNonNegativeNumber, isPositiveNumber, isRecord, isWholeNumber } from './input-checks.ts';
import { EMPTY_TALLY } from './shape-stitches.ts';
import type { StitchEstimate } from './stitch-estimate.ts';

/** A motif from the shop's catalogue, measured from its stitch file at 100 %. */
export interface CatalogueMotif {
  /** Stitches in the file at 100 %, underlay included. */
  stitchCount: number;
  /** Share of running, satin and fill stitches: any non-negative weights, not all zero (e.g. 20/50/30). */
  mix: { run: number; satin: number; fill: number };
  colorChanges: number;
  /** Trims in the file. Default 0. */
  trims?: number;
  /** Stitched size at 100 %, mm. */
  widthMm: number;
  heightMm: number;
}

/**
 * Stitches for a catalogue motif at a scale (1 = 100 %). When an outline file is resized, stitches are
 * recalculated at the set density (lindeegembroidery.com/scaling), so running and satin counts grow with the
 * scale (they follow lengths: path length, column length ÷ spacing) and fill counts with its square (they follow
 * area): common practice, no source. The measured count already holds its underlay, so `byType.underlay` is 0.
 */
export function estimateCatalogueStitches(motif: CatalogueMotif, scale: number): EngineResult<StitchEstimate> {
  if (!isRecord(motif) || !isRecord(motif.mix))
    return fail('The motif record is missing its stitch count or stitch mix.');
  const { stitchCount, mix, colorChanges, widthMm, heightMm } = motif;
  const trims = motif.trims ?? 0;
  if (!isWholeNumber(stitchCount) || !isWholeNumber(colorChanges) || !isWholeNumber(trims)) {
    return fail('The motif stitch count, colour changes and trims must be whole numbers, 0 or more.');
  }
  if (!isNonNegativeNumber(mix.run) || !isNonNegativeNumber(mix.satin) || !isNonNegativeNumber(mix.fill)) {
    return fail('The running, satin and fill shares must be numbers, 0 or more.');
  }
  const weight = mix.run + mix.satin + mix.fill;
  if (!(weight > 0) || !Number.isFinite(weight)) return fail('The stitch mix must give at least one type a share.');
  if (!isPositiveNumber(widthMm) || !isPositiveNumber(heightMm))
    return fail('The motif size must be positive numbers of millimetres.');
  if (!isPositiveNumber(scale)) return fail('The scale must be a positive number (1 = 100 %).');

  const byType = {
    ...EMPTY_TALLY,
    run: Math.round(((stitchCount * mix.run) / weight) * scale),
    satin: Math.round(((stitchCount * mix.satin) / weight) * scale),
    fill: Math.round(((stitchCount * mix.fill) / weight) * scale * scale),
  };
  const stitches = byType.run + byType.satin + byType.fill;
  if (!Number.isSafeInteger(stitches)) return fail('The motif at this scale has more stitches than can be counted.');
  return {
    ok: true,
    stitches,
    colorChanges,
    trims,
    byType,
    widthMm: widthMm * scale,
    heightMm: heightMm * scale,
    notes: [],
  };
}
