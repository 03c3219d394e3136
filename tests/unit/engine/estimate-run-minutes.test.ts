import { describe, expect, it } from 'vitest';
import { DEFAULT_MACHINE_SETTINGS, estimateRunMinutes } from '../../../server/src/engine/index.ts';

describe('estimateRunMinutes', () => {
  it('when a job is itemized, then sewing, stops, hoopings and setup add up to the total', () => {
    const machine = {
      stitchesPerMinute: 700,
      minutesPerColorChange: 1,
      minutesPerTrim: 0.25,
      minutesPerHooping: 5,
      setupMinutes: 10,
    };
    const estimate = estimateRunMinutes({ stitches: 14_000, colorChanges: 6, trims: 8, hoopings: 4, machine });
    expect(estimate.ok).toBe(true);
    if (!estimate.ok) return;
    // 14,000 / 700 = 20 min sewing; 6 × 1 + 8 × 0.25 + 4 × 5 + 10 = 38 min around it.
    expect(estimate.items.map(({ code, minutes }) => [code, minutes])).toEqual([
      ['sewing', 20],
      ['color-changes', 6],
      ['trims', 2],
      ['hoopings', 20],
      ['setup', 10],
    ]);
    expect(estimate.totalMinutes).toBe(58);
    expect(estimate.items[0].label).toBe('Sewing 14,000 stitches at 700 stitches a minute');
  });

  it('when no machine is given, then the documented defaults apply', () => {
    const estimate = estimateRunMinutes({ stitches: 7000, colorChanges: 0, hoopings: 1 });
    const { stitchesPerMinute, minutesPerHooping, setupMinutes } = DEFAULT_MACHINE_SETTINGS;
    expect(estimate.ok && estimate.totalMinutes).toBeCloseTo(
      7000 / stitchesPerMinute + minutesPerHooping + setupMinutes,
      12,
    );
  });

  it.each([
    ['no hooping', { stitches: 100, colorChanges: 0, hoopings: 0 }],
    ['a stopped machine', { stitches: 100, colorChanges: 0, hoopings: 1, machine: { stitchesPerMinute: 0 } }],
    ['negative setup', { stitches: 100, colorChanges: 0, hoopings: 1, machine: { setupMinutes: -1 } }],
    ['fractional stitches', { stitches: 10.5, colorChanges: 0, hoopings: 1 }],
  ])('when given %s, then it fails with a reason', (_, input) => {
    expect(estimateRunMinutes(input).ok).toBe(false);
  });
});
