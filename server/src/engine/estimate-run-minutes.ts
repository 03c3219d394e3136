import { fail, type EngineResult } from './engine-result.ts';
import { isNonNegativeNumber, isPositiveNumber, isRecord, isWholeNumber } from './input-checks.ts';
import { formatCount } from './wording.ts';

/** One machine's pace; every value is a shop setting. */
export interface MachineSettings {
  stitchesPerMinute: number;
  minutesPerColorChange: number;
  minutesPerTrim: number;
  /** Hooping the garment and lining the design up with the marks; re-hooping a border is the slow part. */
  minutesPerHooping: number;
  /** Once per job: threading, loading the design, a test on scrap. */
  setupMinutes: number;
}

export const DEFAULT_MACHINE_SETTINGS: Readonly<MachineSettings> = Object.freeze({
  // 700 spm is the worked example in printwearmag.com "Calculate the cost of thread breaks"; commercial heads run
  // about 1,000 spm (artsentertainment.cc/Art/Other-Art/21940.html), home machines about 400–850 (from memory).
  stitchesPerMinute: 700,
  // Re-threading a single-needle machine by hand: common practice, no source (multi-needle stops take about
  // 6–20 s, from memory).
  minutesPerColorChange: 1,
  // About 6–20 s per stop, from memory; 10 s.
  minutesPerTrim: 10 / 60,
  // Common practice, no source.
  minutesPerHooping: 5,
  // Common practice, no source.
  setupMinutes: 10,
});

export interface RunTimeInput {
  stitches: number;
  colorChanges: number;
  hoopings: number;
  /** Default 0. */
  trims?: number;
  machine?: Partial<MachineSettings>;
}

export type RunTimeItemCode = 'sewing' | 'color-changes' | 'trims' | 'hoopings' | 'setup';

export interface RunTimeItem {
  code: RunTimeItemCode;
  label: string;
  minutes: number;
}

export interface RunTimeEstimate {
  totalMinutes: number;
  items: RunTimeItem[];
}

/**
 * Machine and hands-on time for a job, minutes: stitches ÷ speed + stops × time per stop + hoopings × time per
 * hooping + setup (formula after Printwear, May 2016, p. 32: trims and colour changes cut average output).
 */
export function estimateRunMinutes(input: RunTimeInput): EngineResult<RunTimeEstimate> {
  if (!isRecord(input)) return fail('The run-time estimate needs stitches, colour changes and hoopings.');
  const { stitches, colorChanges, hoopings } = input;
  const trims = input.trims ?? 0;
  if (
    !isWholeNumber(stitches) ||
    !isWholeNumber(colorChanges) ||
    !isWholeNumber(trims) ||
    !isWholeNumber(hoopings, 1)
  ) {
    return fail(
      'Stitches, colour changes and trims must be whole numbers, 0 or more, and there must be at least one hooping.',
    );
  }
  if (input.machine !== undefined && !isRecord(input.machine)) return fail('The machine settings must be an object.');
  const machine = { ...DEFAULT_MACHINE_SETTINGS, ...input.machine };
  if (!isPositiveNumber(machine.stitchesPerMinute))
    return fail('The machine speed must be a positive number of stitches per minute.');
  const { minutesPerColorChange, minutesPerTrim, minutesPerHooping, setupMinutes } = machine;
  if (![minutesPerColorChange, minutesPerTrim, minutesPerHooping, setupMinutes].every(isNonNegativeNumber)) {
    return fail('Times per colour change, trim and hooping, and setup time, must be zero or more minutes.');
  }
  const items: RunTimeItem[] = [
    {
      code: 'sewing',
      label: `Sewing ${formatCount(stitches, 'stitch', 'stitches')} at ${formatCount(machine.stitchesPerMinute, 'stitch', 'stitches')} a minute`,
      minutes: stitches / machine.stitchesPerMinute,
    },
    {
      code: 'color-changes',
      label: formatCount(colorChanges, 'colour change'),
      minutes: colorChanges * minutesPerColorChange,
    },
    { code: 'trims', label: formatCount(trims, 'trim'), minutes: trims * minutesPerTrim },
    { code: 'hoopings', label: formatCount(hoopings, 'hooping'), minutes: hoopings * minutesPerHooping },
    { code: 'setup', label: 'Setup', minutes: setupMinutes },
  ];
  const totalMinutes = items.reduce((sum, item) => sum + item.minutes, 0);
  if (!Number.isFinite(totalMinutes)) return fail('The run time is too large to compute.');
  return { ok: true, totalMinutes, items };
}
