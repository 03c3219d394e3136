import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fitBorder, planHoopings, type HoopingPlanInput } from '../../../server/src/engine/index.ts';

const hoop5x7 = { fieldWidthMm: 120, fieldHeightMm: 180 };

function orderOf(input: HoopingPlanInput): number[][] {
  const plan = planHoopings(input);
  if (!plan.ok) throw new Error(plan.reason);
  return plan.hoopings.map((hooping) => hooping.repeatIndices);
}

describe('planHoopings', () => {
  it('when 4 repeats of 173 mm go in a 120 × 180 mm hoop, then it is 1 per hooping, 4 hoopings, centre first', () => {
    // Worked case from issue 3 (common practice of the trade), continuing the 692 mm hem loop.
    const fit = fitBorder({ runLengthMm: 692, closed: true, motifWidthMm: 180, minScale: 0.9, maxScale: 1.1 });
    if (!fit.ok) throw new Error(fit.reason);
    const plan = planHoopings({
      count: fit.count,
      repeatWidthMm: fit.repeatWidthMm,
      pitchMm: fit.pitchMm,
      motifHeightMm: 60,
      hoop: hoop5x7,
      firstCenterMm: fit.centersMm[0],
    });
    expect(plan.ok).toBe(true);
    if (!plan.ok) return;
    expect(plan.perHooping).toBe(1);
    expect(plan.hoopings).toHaveLength(4);
    expect(plan.rotated).toBe(true);
    // The middle of 4 repeats falls between hoopings 2 and 3; the left one (repeat index 1) goes first.
    expect(plan.hoopings.map((h) => [h.order, h.repeatIndices, h.side])).toEqual([
      [1, [1], 'center'],
      [2, [0], 'left'],
      [3, [2], 'right'],
      [4, [3], 'right'],
    ]);
    // One repeat per hooping: each hoop centre sits on its repeat's centre along the loop.
    expect(plan.hoopings.map((h) => h.centerMm)).toEqual([259.5, 86.5, 432.5, 605.5].map((c) => expect.closeTo(c, 9)));
  });

  it('when several repeats fit one hooping, then runs are as even as possible and stitched centre, left, right', () => {
    // 10 repeats of 40 mm at a 45 mm pitch in a 200 mm row: (200 − 40) / 45 + 1 = 4 per hooping, 3 hoopings.
    const plan = planHoopings({
      count: 10,
      repeatWidthMm: 40,
      pitchMm: 45,
      motifHeightMm: 30,
      hoop: { fieldWidthMm: 200, fieldHeightMm: 140 },
    });
    expect(plan.ok && plan.perHooping).toBe(4);
    expect(plan.ok && plan.rotated).toBe(false);
    expect(
      orderOf({
        count: 10,
        repeatWidthMm: 40,
        pitchMm: 45,
        motifHeightMm: 30,
        hoop: { fieldWidthMm: 200, fieldHeightMm: 140 },
      }),
    ).toEqual([
      [3, 4, 5, 6],
      [0, 1, 2],
      [7, 8, 9],
    ]);
  });

  it('when an odd number of hoopings is needed, then the middle hooping goes first and sides alternate left first', () => {
    expect(orderOf({ count: 5, repeatWidthMm: 100, pitchMm: 100, motifHeightMm: 50, hoop: hoop5x7 })).toEqual([
      [2],
      [1],
      [3],
      [0],
      [4],
    ]);
  });

  it('when clearance is kept at the ends, then fewer repeats fit a hooping', () => {
    const input = { count: 6, repeatWidthMm: 50, pitchMm: 55, motifHeightMm: 40, hoop: hoop5x7 };
    // 180 mm row: (180 − 50) / 55 + 1 → 3; with 15 mm at each end: (150 − 50) / 55 + 1 → 2.
    expect(planHoopings(input)).toMatchObject({ ok: true, perHooping: 3 });
    expect(planHoopings({ ...input, clearanceMm: 15 })).toMatchObject({ ok: true, perHooping: 2 });
  });

  it('when the motif is taller than the short side but fits the long one, then the row runs along the short side', () => {
    const plan = planHoopings({ count: 2, repeatWidthMm: 100, pitchMm: 100, motifHeightMm: 150, hoop: hoop5x7 });
    expect(plan).toMatchObject({ ok: true, perHooping: 1, rotated: false });
  });

  it.each([
    [
      'a motif taller than the field',
      { count: 2, repeatWidthMm: 50, pitchMm: 50, motifHeightMm: 200, hoop: hoop5x7 },
      /200 mm tall/,
    ],
    [
      'a repeat wider than the field',
      { count: 2, repeatWidthMm: 190, pitchMm: 190, motifHeightMm: 50, hoop: hoop5x7 },
      /190 mm wide/,
    ],
    ['a zero count', { count: 0, repeatWidthMm: 50, pitchMm: 50, motifHeightMm: 50, hoop: hoop5x7 }, /whole number/],
    ['no hoop', { count: 2, repeatWidthMm: 50, pitchMm: 50, motifHeightMm: 50 }, /hoop/],
  ])('when given %s, then it fails with a reason', (_, input, reason) => {
    const plan = planHoopings(input as HoopingPlanInput);
    expect(plan.ok).toBe(false);
    expect(!plan.ok && plan.reason).toMatch(reason);
  });

  it('property: hoopings cover every repeat exactly once, never overfill, and fit the field', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 200 }),
        fc.double({ min: 5, max: 150, noNaN: true }),
        fc.double({ min: 0.5, max: 1.5, noNaN: true }),
        fc.double({ min: 0, max: 10, noNaN: true }),
        (count, repeatWidthMm, pitchFactor, clearanceMm) => {
          const input = {
            count,
            repeatWidthMm,
            pitchMm: repeatWidthMm * pitchFactor,
            motifHeightMm: 40,
            hoop: { fieldWidthMm: 180, fieldHeightMm: 130 },
            clearanceMm,
          };
          const plan = planHoopings(input);
          if (!plan.ok) return;
          expect(plan.perHooping * plan.hoopings.length).toBeGreaterThanOrEqual(count);
          const covered = plan.hoopings.flatMap((h) => h.repeatIndices).sort((a, b) => a - b);
          expect(covered).toEqual(Array.from({ length: count }, (_, i) => i));
          expect(plan.hoopings.map((h) => h.order)).toEqual(plan.hoopings.map((_, i) => i + 1));
          expect(plan.hoopings.filter((h) => h.side === 'center')).toHaveLength(1);
          for (const { repeatIndices } of plan.hoopings) {
            expect(repeatIndices.length).toBeLessThanOrEqual(plan.perHooping);
            const spanMm = (repeatIndices.length - 1) * input.pitchMm + repeatWidthMm;
            expect(spanMm).toBeLessThanOrEqual(180 - 2 * clearanceMm + 1e-6);
          }
          const sizes = plan.hoopings.map((h) => h.repeatIndices.length);
          expect(Math.max(...sizes) - Math.min(...sizes)).toBeLessThanOrEqual(1);
        },
      ),
    );
  });
});
