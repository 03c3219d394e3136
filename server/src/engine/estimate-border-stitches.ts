import { fail, type EngineResult } from './engine-result.ts';
import type { BorderFit } from './fit-border.ts';
import { isPositiveNumber, isRecord, isWholeNumber } from './input-checks.ts';
import type { StitchEstimate } from './stitch-estimate.ts';

export interface BorderStitchInput {
  /** The estimate for one repeat at the border's scale. */
  repeat: StitchEstimate;
  fit: Pick<BorderFit, 'count' | 'pitchMm' | 'repeatWidthMm'>;
  /** Number of hoopings from `planHoopings`. */
  hoopings: number;
}

/**
 * A whole border from one repeat. Each hooping is sewn colour by colour: (colours − 1) changes inside it, plus
 * one back to the first colour when the next hooping starts (none for a one-colour motif). Inside a hooping, each
 * colour jumps from repeat to repeat, one trim per further repeat. Both are common practice, no source.
 */
export function estimateBorderStitches(input: BorderStitchInput): EngineResult<StitchEstimate> {
  if (!isRecord(input) || !isRecord(input.repeat) || !isRecord(input.fit))
    return fail("The border estimate needs one repeat's estimate and the border fit.");
  const { repeat, fit, hoopings } = input;
  if (!isWholeNumber(fit.count, 1) || !isPositiveNumber(fit.pitchMm) || !isPositiveNumber(fit.repeatWidthMm)) {
    return fail('The border fit must have a whole repeat count and positive pitch and width.');
  }
  if (!isWholeNumber(hoopings, 1) || hoopings > fit.count)
    return fail('The number of hoopings must be a whole number from 1 to the number of repeats.');
  if (
    !isWholeNumber(repeat.stitches) ||
    !isWholeNumber(repeat.colorChanges) ||
    !isWholeNumber(repeat.trims) ||
    !isRecord(repeat.byType)
  ) {
    return fail('The repeat estimate is incomplete.');
  }
  const colours = repeat.colorChanges + 1;
  const { run, satin, fill, underlay } = repeat.byType;
  return {
    ok: true,
    stitches: repeat.stitches * fit.count,
    colorChanges: hoopings * (colours - 1) + (colours > 1 ? hoopings - 1 : 0),
    trims: repeat.trims * fit.count + colours * (fit.count - hoopings),
    byType: { run: run * fit.count, satin: satin * fit.count, fill: fill * fit.count, underlay: underlay * fit.count },
    widthMm: (fit.count - 1) * fit.pitchMm + fit.repeatWidthMm,
    heightMm: repeat.heightMm,
    notes: repeat.notes,
  };
}
