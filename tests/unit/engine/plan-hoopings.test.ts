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
    // The middle of 4 repeats falls between the 2nd and 3rd from the left; the left one (repeat index 1) goes first,
    // then the right one beside the mark (issue 11: not the far left one before the near right one).
    expect(plan.hoopings.map((h) => [h.order, h.repeatIndices, h.side])).toEqual([
      [1, [1], 'center'],
      [2, [2], 'right'],
      [3, [0], 'left'],
      [4, [3], 'right'],
    ]);
    // One repeat per hooping: each hoop centre sits on its repeat's centre along the loop.
    expect(plan.hoopings.map((h) => h.centerMm)).toEqual([259.5, 432.5, 86.5, 605.5].map((c) => expect.closeTo(c, 9)));
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

  // Issue 11's rule (outwards from the centre mark is common practice, no source): positions 1…n from the left, in
  // the order they are sewn; each new hooping is beside one already sewn.
  it.each([
    [1, [1]],
    [2, [1, 2]],
    [3, [2, 1, 3]],
    [4, [2, 3, 1, 4]],
    [5, [3, 2, 4, 1, 5]],
    [6, [3, 4, 2, 5, 1, 6]],
    [7, [4, 3, 5, 2, 6, 1, 7]],
    [8, [4, 5, 3, 6, 2, 7, 1, 8]],
  ])(
    'when a border needs %i hoopings, then they are sewn outwards from the centre mark: %j from the left',
    (n, sewn) => {
      const plan = planHoopings({ count: n, repeatWidthMm: 150, pitchMm: 150, motifHeightMm: 50, hoop: hoop5x7 });
      if (!plan.ok) throw new Error(plan.reason);
      const positions = plan.hoopings.map((hooping) => hooping.repeatIndices[0] + 1);
      expect(positions).toEqual(sewn);
      positions.forEach((position, i) => {
        if (i > 0) expect(positions.slice(0, i).some((done) => Math.abs(done - position) === 1)).toBe(true);
      });
      // Never farther from the centre mark than a hooping sewn after it.
      const fromMark = plan.hoopings.map((hooping) => Math.abs(hooping.centerMm - (n * 150) / 2));
      fromMark.forEach((distance, i) => expect(distance).toBeLessThanOrEqual(Math.min(...fromMark.slice(i)) + 1e-9));
    },
  );

  it('when a 173 mm repeat goes in a 180 mm row, then 3 mm clearance at each end still holds it and 4 mm refuses it', () => {
    // Issue 11: 180 − 2 × 3 = 174 mm ≥ 173 (0.5 mm spare at each end); 180 − 2 × 4 = 172 mm < 173.
    const input = { count: 4, repeatWidthMm: 173, pitchMm: 173, motifHeightMm: 38.4, hoop: hoop5x7 };
    expect(planHoopings({ ...input, clearanceMm: 3 })).toMatchObject({ ok: true, perHooping: 1 });
    expect(planHoopings({ ...input, clearanceMm: 3.5 })).toMatchObject({ ok: true, perHooping: 1 });
    expect(planHoopings({ ...input, clearanceMm: 4 })).toEqual({
      ok: false,
      reason:
        'One repeat is 173 mm wide, but this hoop leaves 172 mm (a 180 mm field less 4 mm clearance at each edge).',
    });
  });

  it('when clearance is kept, then it is kept across the row too: a motif as tall as the short side no longer fits across it', () => {
    const input = { count: 2, repeatWidthMm: 60, pitchMm: 60, motifHeightMm: 118, hoop: hoop5x7 };
    expect(planHoopings(input)).toMatchObject({ ok: true, rotated: true });
    // 120 − 2 × 3 = 114 mm across: 118 mm now only fits across the long side, so the row runs along the short one.
    expect(planHoopings({ ...input, clearanceMm: 3 })).toMatchObject({ ok: true, rotated: false, perHooping: 1 });
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
