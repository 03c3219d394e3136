import { fail, type EngineResult } from './engine-result.ts';
import { usableField } from './hoop-fit.ts';
import { MAX_BORDER_REPEATS } from './fit-border.ts';
import { isNonNegativeNumber, isPositiveNumber, isRecord, isWholeNumber } from './input-checks.ts';
import { formatNumber } from './wording.ts';

/** Slack for "does it fit" comparisons, mm, so a span equal to the field is not rejected by rounding. */
const FIT_SLACK_MM = 1e-9;

/** The sewing field: the area the machine can reach inside the hoop, smaller than the frame. */
export interface HoopField {
  /** Across the machine, mm. */
  fieldWidthMm: number;
  /** Front to back, mm. */
  fieldHeightMm: number;
}

export interface HoopingPlanInput {
  count: number;
  /** Width of one stitched repeat, mm. */
  repeatWidthMm: number;
  /** Start-to-start distance between repeats, mm. */
  pitchMm: number;
  /** Height of the stitched motif across the row, mm. */
  motifHeightMm: number;
  hoop: HoopField;
  /** Kept free inside the field at each edge, mm (the hoop's clearance setting): at both ends of the row and on
   * either side of it. Default 0. */
  clearanceMm?: number;
  /** Centre of the first repeat, mm from the run's start (`fitBorder`'s `centersMm[0]`). Default: half a repeat. */
  firstCenterMm?: number;
}

export type HoopingSide = 'center' | 'left' | 'right';

export interface Hooping {
  /** Stitching order, 1 first. */
  order: number;
  /** Zero-based indices of the repeats stitched in this hooping, left to right. */
  repeatIndices: number[];
  /** Where the hoop's centre goes along the run, mm from the run's start: the embroiderer marks it. */
  centerMm: number;
  side: HoopingSide;
}

export interface HoopingPlan {
  /** The most consecutive repeats one hooping can hold. */
  perHooping: number;
  /** In stitching order: see `planHoopings` for the rule. */
  hoopings: Hooping[];
  /** True when the row runs along the field's height, so the design is turned 90° in the hoop. */
  rotated: boolean;
}

/**
 * Splits a row of border repeats into hoopings and orders them the way the trade stitches a border: outwards from
 * the centre mark, so each new hooping is lined up against stitches already sewn. The rule: first the hooping that
 * holds the row's middle (with an even number of hoopings the middle falls between two, and the left one goes
 * first); then always the unsewn hooping nearest the centre mark, the left one first when two are equally near.
 * So 3 hoopings, left to right, are sewn 2, 1, 3 and 4 are sewn 2, 3, 1, 4 (issue 11: the near right one before
 * the far left one). The rule of outwards from the centre is common practice, no source.
 */
export function planHoopings(input: HoopingPlanInput): EngineResult<HoopingPlan> {
  if (!isRecord(input) || !isRecord(input.hoop)) return fail('The hooping plan needs the repeats and a hoop.');
  const { count, repeatWidthMm, pitchMm, motifHeightMm } = input;
  const { fieldWidthMm, fieldHeightMm } = input.hoop;
  const clearanceMm = input.clearanceMm ?? 0;
  if (!isWholeNumber(count, 1) || count > MAX_BORDER_REPEATS)
    return fail(`The number of repeats must be a whole number from 1 to ${MAX_BORDER_REPEATS}.`);
  if (!isPositiveNumber(repeatWidthMm) || !isPositiveNumber(pitchMm) || !isPositiveNumber(motifHeightMm)) {
    return fail('The repeat width, pitch and motif height must be positive numbers of millimetres.');
  }
  if (!isPositiveNumber(fieldWidthMm) || !isPositiveNumber(fieldHeightMm))
    return fail('The hoop sewing field must have a positive width and height in millimetres.');
  if (!isNonNegativeNumber(clearanceMm)) return fail('The clearance must be zero or a positive number of millimetres.');
  const firstCenterMm = input.firstCenterMm ?? repeatWidthMm / 2;
  if (!isNonNegativeNumber(firstCenterMm))
    return fail('The first repeat centre must be zero or a positive number of millimetres.');

  const usable = usableField({ fieldWidthMm, fieldHeightMm, clearanceMm });
  const keptClear = clearanceMm > 0 ? ` less ${formatNumber(clearanceMm)} mm clearance at each edge` : '';
  const row = orientRow(motifHeightMm, usable.widthMm, usable.heightMm);
  if (!row) {
    return fail(
      `The motif is ${formatNumber(motifHeightMm)} mm tall, more than either side of this hoop's ${formatNumber(fieldWidthMm)} × ${formatNumber(fieldHeightMm)} mm sewing field${keptClear}.`,
    );
  }
  const usableMm = row.lengthMm;
  if (repeatWidthMm > usableMm + FIT_SLACK_MM) {
    const fieldMm = row.lengthMm + 2 * clearanceMm;
    return fail(
      `One repeat is ${formatNumber(repeatWidthMm)} mm wide, but this hoop leaves ${formatNumber(usableMm)} mm ` +
        `(a ${formatNumber(fieldMm)} mm field${keptClear}).`,
    );
  }
  const perHooping = Math.min(count, Math.floor((usableMm - repeatWidthMm + FIT_SLACK_MM) / pitchMm) + 1);
  const runs = splitEvenly(count, Math.ceil(count / perHooping));
  const centre = centreRunIndex(runs, count);
  const hoopings = stitchingOrder(runs.length, centre).map((runIndex, i): Hooping => {
    const repeatIndices = runs[runIndex];
    const midIndex = (repeatIndices[0] + repeatIndices[repeatIndices.length - 1]) / 2;
    return {
      order: i + 1,
      repeatIndices,
      centerMm: firstCenterMm + midIndex * pitchMm,
      side: runIndex === centre ? 'center' : runIndex < centre ? 'left' : 'right',
    };
  });
  return { ok: true, perHooping, hoopings, rotated: row.rotated };
}

/** The row runs along the longer side when the motif's height fits across the shorter one, else the other way. */
function orientRow(
  motifHeightMm: number,
  widthMm: number,
  heightMm: number,
): { lengthMm: number; rotated: boolean } | undefined {
  const longMm = Math.max(widthMm, heightMm);
  const shortMm = Math.min(widthMm, heightMm);
  if (motifHeightMm <= shortMm + FIT_SLACK_MM) return { lengthMm: longMm, rotated: heightMm > widthMm };
  if (motifHeightMm <= longMm + FIT_SLACK_MM) return { lengthMm: shortMm, rotated: heightMm < widthMm };
  return undefined;
}

/**
 * Consecutive runs whose sizes differ by at most one. The longer runs go nearest the middle of the row (left
 * first on a tie), so the layout is symmetric about the garment's centre whenever the numbers allow.
 */
function splitEvenly(count: number, runCount: number): number[][] {
  const base = Math.floor(count / runCount);
  const middle = (runCount - 1) / 2;
  const byCloseness = Array.from({ length: runCount }, (_, j) => j).sort(
    (a, b) => Math.abs(a - middle) - Math.abs(b - middle) || a - b,
  );
  const sizes = new Array<number>(runCount).fill(base);
  for (const j of byCloseness.slice(0, count % runCount)) sizes[j] += 1;
  let next = 0;
  return sizes.map((size) => Array.from({ length: size }, () => next++));
}

/** The run holding the row's middle; when the middle falls on a boundary between two runs, the left one. */
function centreRunIndex(runs: number[][], count: number): number {
  return runs.findIndex((run) => 2 * run[0] < count && count <= 2 * (run[run.length - 1] + 1));
}

/**
 * The centre run first, then the others by their distance in hoopings from the middle of the row, left first on a
 * tie: for an even count the two beside the middle come first, then one left, one right, outwards.
 */
function stitchingOrder(runCount: number, centre: number): number[] {
  const middle = (runCount - 1) / 2;
  const others = Array.from({ length: runCount }, (_, j) => j).filter((j) => j !== centre);
  others.sort((a, b) => Math.abs(a - middle) - Math.abs(b - middle) || a - b);
  return [centre, ...others];
}
