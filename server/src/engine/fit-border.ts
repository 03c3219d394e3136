import type { EngineResult, Failure } from './engine-result.ts';
import { isFiniteNumber, isNonNegativeNumber, isPositiveNumber, isRecord } from './input-checks.ts';
import { formatCount, formatNumber, formatPercent } from './wording.ts';

/** More repeats than this is not a garment border; the cap also keeps `centersMm` a sane size. */
export const MAX_BORDER_REPEATS = 10_000;

/** Relative slack when comparing a computed scale with the allowed range, so 0.9 is not rejected as 0.8999999. */
const SCALE_SLACK = 1e-9;

export interface BorderFitInput {
  /** Length of the run: the hem panel (open) or the whole circumference (closed), mm. */
  runLengthMm: number;
  /** True when the last repeat meets the first (a hem loop). */
  closed: boolean;
  /** Width of one motif at 100 %, mm. */
  motifWidthMm: number;
  /** Space after each motif at 100 %, mm; negative overlaps. It scales with the motif. Default 0. */
  gapMm?: number;
  /** Smallest and largest scale the motif can be stitched at (1 = 100 %). */
  minScale: number;
  maxScale: number;
  /** Open runs only: clear space kept at each end, mm. Default 0. */
  endMarginMm?: number;
  /** The customer asks for exactly this many repeats. */
  count?: number;
}

export interface BorderFit {
  count: number;
  /** Scale applied to the motif (1 = 100 %). */
  scale: number;
  /** Width of one stitched repeat, mm. */
  repeatWidthMm: number;
  /** Distance from one repeat's start to the next one's, mm. */
  pitchMm: number;
  /** Each repeat's centre, mm from the run's start. */
  centersMm: number[];
}

/** A count with the scale it needs, offered when the request cannot be met. */
export interface BorderSuggestion {
  count: number;
  scale: number;
  isWithinLimits: boolean;
}

export interface BorderFitFailure extends Failure {
  nearest?: BorderSuggestion;
}

interface Layout {
  closed: boolean;
  motifWidthMm: number;
  gapMm: number;
  /** Length the repeats must span exactly, mm. */
  spanMm: number;
  minScale: number;
  maxScale: number;
  endMarginMm: number;
}

/**
 * Fits N repeats of a motif along a run so they meet exactly.
 * Closed: count × scale × (motif + gap) = run. Open: scale × (count × motif + (count − 1) × gap) = run − 2 × margin,
 * centred. Picks the count whose scale is within limits and closest to 100 % (ties: more repeats).
 */
export function fitBorder(input: BorderFitInput): EngineResult<BorderFit, BorderFitFailure> {
  const layout = readLayout(input);
  if ('reason' in layout) return layout;
  const requested = isRecord(input) ? input.count : undefined;
  if (requested !== undefined) return fitRequestedCount(layout, requested);

  const range = feasibleCounts(layout);
  if (range.lowest > MAX_BORDER_REPEATS) return tooManyRepeats();
  if (range.lowest <= range.highest) {
    const ideal = idealCount(layout);
    const highest = Math.min(range.highest, MAX_BORDER_REPEATS);
    const candidates = [Math.floor(ideal), Math.ceil(ideal)].map((n) => Math.min(highest, Math.max(range.lowest, n)));
    return placeRepeats(layout, bestCount(layout, candidates));
  }
  return explainNoFit(layout, range.highest);
}

function readLayout(input: BorderFitInput): Layout | BorderFitFailure {
  if (!isRecord(input)) return { ok: false, reason: 'The border description is missing.' };
  const { runLengthMm, closed, motifWidthMm, minScale, maxScale } = input;
  const gapMm = input.gapMm ?? 0;
  const endMarginMm = input.endMarginMm ?? 0;
  if (!isPositiveNumber(runLengthMm))
    return { ok: false, reason: 'The run length must be a positive number of millimetres.' };
  if (typeof closed !== 'boolean')
    return { ok: false, reason: 'Say whether the border is a closed loop or an open run.' };
  if (!isPositiveNumber(motifWidthMm))
    return { ok: false, reason: 'The motif width must be a positive number of millimetres.' };
  if (!isFiniteNumber(gapMm)) return { ok: false, reason: 'The gap between repeats must be a number of millimetres.' };
  if (motifWidthMm + gapMm <= 0)
    return { ok: false, reason: 'The overlap is as wide as the motif, so the repeats would not advance.' };
  if (!isPositiveNumber(minScale) || !isPositiveNumber(maxScale))
    return { ok: false, reason: 'The scale limits must be positive numbers.' };
  if (minScale > maxScale)
    return {
      ok: false,
      reason: `The minimum scale (${formatPercent(minScale)}) is above the maximum (${formatPercent(maxScale)}).`,
    };
  if (!isNonNegativeNumber(endMarginMm))
    return { ok: false, reason: 'The end margin must be zero or a positive number of millimetres.' };
  const spanMm = closed ? runLengthMm : runLengthMm - 2 * endMarginMm;
  if (spanMm <= 0) {
    return {
      ok: false,
      reason: `End margins of 2 × ${formatNumber(endMarginMm)} mm leave no room on a ${formatNumber(runLengthMm)} mm run.`,
    };
  }
  return { closed, motifWidthMm, gapMm, spanMm, minScale, maxScale, endMarginMm: closed ? 0 : endMarginMm };
}

/** Motif-plus-gap lengths at 100 % that `count` repeats occupy. */
function unscaledLength(layout: Layout, count: number): number {
  const pitch = layout.motifWidthMm + layout.gapMm;
  return layout.closed ? count * pitch : count * pitch - layout.gapMm;
}

function scaleFor(layout: Layout, count: number): number {
  return layout.spanMm / unscaledLength(layout, count);
}

/** The (fractional) count that would need exactly 100 %. */
function idealCount(layout: Layout): number {
  const pitch = layout.motifWidthMm + layout.gapMm;
  return layout.closed ? layout.spanMm / pitch : (layout.spanMm + layout.gapMm) / pitch;
}

/** Counts whose scale lies within the limits; `lowest > highest` when there is none. */
function feasibleCounts(layout: Layout): { lowest: number; highest: number } {
  const pitch = layout.motifWidthMm + layout.gapMm;
  const countAt = (scale: number) =>
    layout.closed ? layout.spanMm / (scale * pitch) : (layout.spanMm / scale + layout.gapMm) / pitch;
  const lowest = Math.max(1, Math.ceil(countAt(layout.maxScale) * (1 - SCALE_SLACK)));
  const highest = Math.floor(countAt(layout.minScale) * (1 + SCALE_SLACK));
  return { lowest, highest };
}

function isWithinLimits(layout: Layout, scale: number): boolean {
  return scale >= layout.minScale * (1 - SCALE_SLACK) && scale <= layout.maxScale * (1 + SCALE_SLACK);
}

/** The candidate with the least distortion; on a tie the larger count wins. */
function bestCount(layout: Layout, candidates: number[]): number {
  return candidates.reduce((best, n) => {
    const diff = Math.abs(scaleFor(layout, n) - 1) - Math.abs(scaleFor(layout, best) - 1);
    return diff < -SCALE_SLACK || (Math.abs(diff) <= SCALE_SLACK && n > best) ? n : best;
  });
}

function tooManyRepeats(): BorderFitFailure {
  return {
    ok: false,
    reason: `This would need more than ${MAX_BORDER_REPEATS} repeats; check the run length and motif width.`,
  };
}

function placeRepeats(layout: Layout, count: number): EngineResult<BorderFit, BorderFitFailure> {
  const scale = scaleFor(layout, count);
  const repeatWidthMm = scale * layout.motifWidthMm;
  const pitchMm = scale * (layout.motifWidthMm + layout.gapMm);
  const firstCenterMm = layout.endMarginMm + repeatWidthMm / 2;
  const centersMm = Array.from({ length: count }, (_, i) => firstCenterMm + i * pitchMm);
  return { ok: true, count, scale, repeatWidthMm, pitchMm, centersMm };
}

function fitRequestedCount(layout: Layout, count: unknown): EngineResult<BorderFit, BorderFitFailure> {
  if (!Number.isSafeInteger(count) || (count as number) < 1)
    return { ok: false, reason: 'The number of repeats must be a whole number, 1 or more.' };
  const n = count as number;
  if (n > MAX_BORDER_REPEATS) return tooManyRepeats();
  const scale = scaleFor(layout, n);
  if (isWithinLimits(layout, scale)) return placeRepeats(layout, n);

  // The feasible count closest to the one asked for; without one, the count whose scale is nearest the limits.
  const range = feasibleCounts(layout);
  const nearest =
    range.lowest <= range.highest && range.lowest <= MAX_BORDER_REPEATS
      ? suggestion(layout, Math.min(range.highest, MAX_BORDER_REPEATS, Math.max(range.lowest, n)))
      : closestInfeasible(layout, range.highest);
  return { ok: false, reason: `${formatCount(n, 'repeat')} would need ${limitWording(layout, scale)}.`, nearest };
}

/** `fewer` is the largest count that needs at least the minimum scale; here it needs more than the maximum. */
function explainNoFit(layout: Layout, fewer: number): BorderFitFailure {
  const nearest = closestInfeasible(layout, fewer);
  if (fewer < 1) {
    return {
      ok: false,
      reason: `The run is too short: one repeat needs ${limitWording(layout, scaleFor(layout, 1))}.`,
      nearest,
    };
  }
  return {
    ok: false,
    reason:
      `${formatCount(fewer, 'repeat')} need ${formatPercent(scaleFor(layout, fewer))} and ${formatCount(fewer + 1, 'repeat')} need ${formatPercent(scaleFor(layout, fewer + 1))}; ` +
      `this motif allows ${formatPercent(layout.minScale)} to ${formatPercent(layout.maxScale)}.`,
    nearest,
  };
}

/**
 * When no count fits: `fewer` repeats need more than the maximum and `fewer + 1` less than the minimum; offer the
 * one whose scale misses its limit by the smaller ratio.
 */
function closestInfeasible(layout: Layout, fewer: number): BorderSuggestion {
  if (fewer < 1) return suggestion(layout, 1);
  const overBy = scaleFor(layout, fewer) / layout.maxScale;
  const underBy = layout.minScale / scaleFor(layout, fewer + 1);
  return suggestion(layout, overBy <= underBy ? fewer : fewer + 1);
}

function suggestion(layout: Layout, count: number): BorderSuggestion {
  const scale = scaleFor(layout, count);
  return { count, scale, isWithinLimits: isWithinLimits(layout, scale) };
}

function limitWording(layout: Layout, scale: number): string {
  return scale < layout.minScale
    ? `${formatPercent(scale)} — below the ${formatPercent(layout.minScale)} minimum for this motif`
    : `${formatPercent(scale)} — above the ${formatPercent(layout.maxScale)} maximum for this motif`;
}

/** A catalogue motif's width, gap and resize limits, the limits in whole percent as the studio enters them. */
export interface BorderMotifLimits {
  widthMm: number;
  gapMm: number;
  minScalePct: number;
  maxScalePct: number;
}

/**
 * fitBorder for a catalogue motif: the one place percent limits become the engine's scale factors, so the server's
 * quote and the storefront's drawing fit a border the same way.
 */
export function fitMotifBorder(
  motif: BorderMotifLimits,
  run: { runLengthMm: number; closed: boolean; count?: number },
): EngineResult<BorderFit, BorderFitFailure> {
  return fitBorder({
    ...run,
    motifWidthMm: motif.widthMm,
    gapMm: motif.gapMm,
    minScale: motif.minScalePct / 100,
    maxScale: motif.maxScalePct / 100,
  });
}
