import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fitBorder, MAX_BORDER_REPEATS, type BorderFitInput } from '../../../server/src/engine/index.ts';

const hemLoop: BorderFitInput = { runLengthMm: 692, closed: true, motifWidthMm: 180, minScale: 0.9, maxScale: 1.1 };

describe('fitBorder', () => {
  it('when a 692 mm hem loop takes a 180 mm motif at 90–110 %, then 4 repeats at 96.1 % (173 mm) close the loop', () => {
    // Worked case from issue 3 (common practice of the trade): 692 / 4 = 173 mm, 173 / 180 = 96.1 %.
    const fit = fitBorder(hemLoop);
    expect(fit.ok).toBe(true);
    if (!fit.ok) return;
    expect(fit.count).toBe(4);
    expect(fit.scale).toBeCloseTo(0.9611, 4);
    expect(fit.repeatWidthMm).toBeCloseTo(173, 9);
    expect(fit.pitchMm).toBeCloseTo(173, 9);
    expect(fit.count * fit.pitchMm).toBeCloseTo(692, 9);
    expect(fit.centersMm).toEqual([86.5, 259.5, 432.5, 605.5].map((c) => expect.closeTo(c, 9)));
  });

  it('when an open run has end margins and gaps, then the repeats span the run less both margins, centred', () => {
    const fit = fitBorder({
      runLengthMm: 400,
      closed: false,
      motifWidthMm: 50,
      gapMm: 10,
      minScale: 0.8,
      maxScale: 1.2,
      endMarginMm: 20,
    });
    expect(fit.ok).toBe(true);
    if (!fit.ok) return;
    // 360 mm for n·50 + (n−1)·10: n = 6 needs 360/350 = 102.9 %, n = 7 needs 360/410 = 87.8 %.
    expect(fit.count).toBe(6);
    expect(fit.scale).toBeCloseTo(360 / 350, 12);
    const firstStart = fit.centersMm[0] - fit.repeatWidthMm / 2;
    const lastEnd = fit.centersMm[fit.count - 1] + fit.repeatWidthMm / 2;
    expect(firstStart).toBeCloseTo(20, 9);
    expect(lastEnd).toBeCloseTo(380, 9);
  });

  it('when two counts are equally far from 100 %, then the larger count wins', () => {
    // 100 mm motif on a closed 250 mm loop: 2 repeats need 125 %, 3 need 83.3 %; on 240 mm: 120 % vs 80 %.
    // Equal distortion needs s₂ − 1 = 1 − s₃ → L/200 + L/300 = 2 → L = 240 mm.
    const fit = fitBorder({ runLengthMm: 240, closed: true, motifWidthMm: 100, minScale: 0.5, maxScale: 1.5 });
    expect(fit.ok && fit.count).toBe(3);
  });

  it('when the customer asks for a feasible count, then that count is used even if another is closer to 100 %', () => {
    const fit = fitBorder({ ...hemLoop, count: 4, minScale: 0.5, maxScale: 2 });
    expect(fit.ok && fit.count).toBe(4);
    const five = fitBorder({ ...hemLoop, count: 5, minScale: 0.5, maxScale: 2 });
    expect(five.ok && five.scale).toBeCloseTo(692 / 900, 12);
  });

  it('when the requested count needs too small a scale, then it says so in words and proposes the nearest feasible count', () => {
    const fit = fitBorder({ ...hemLoop, count: 5 });
    expect(fit.ok).toBe(false);
    if (fit.ok) return;
    expect(fit.reason).toBe('5 repeats would need 76.9 % — below the 90 % minimum for this motif.');
    expect(fit.nearest).toEqual({ count: 4, scale: expect.closeTo(692 / 720, 12), isWithinLimits: true });
  });

  it('when the run is too short for even one repeat, then the reason gives the scale it would need', () => {
    const fit = fitBorder({ runLengthMm: 110, closed: false, motifWidthMm: 180, minScale: 0.9, maxScale: 1.1 });
    expect(fit.ok).toBe(false);
    if (fit.ok) return;
    expect(fit.reason).toBe('The run is too short: one repeat needs 61.1 % — below the 90 % minimum for this motif.');
    expect(fit.nearest).toEqual({ count: 1, scale: expect.closeTo(110 / 180, 12), isWithinLimits: false });
  });

  it('when the scale window falls between two counts, then both counts and the window are named', () => {
    const fit = fitBorder({ runLengthMm: 500, closed: true, motifWidthMm: 110, minScale: 0.95, maxScale: 1.05 });
    expect(fit.ok).toBe(false);
    if (fit.ok) return;
    expect(fit.reason).toBe('4 repeats need 113.6 % and 5 repeats need 90.9 %; this motif allows 95 % to 105 %.');
    expect(fit.nearest?.count).toBe(5);
  });

  it.each([
    ['a non-finite run', { ...hemLoop, runLengthMm: Number.NaN }],
    ['a zero run', { ...hemLoop, runLengthMm: 0 }],
    ['a negative motif', { ...hemLoop, motifWidthMm: -5 }],
    ['min above max', { ...hemLoop, minScale: 1.2, maxScale: 1.1 }],
    ['a count below 1', { ...hemLoop, count: 0 }],
    ['a fractional count', { ...hemLoop, count: 2.5 }],
    ['an overlap as wide as the motif', { ...hemLoop, gapMm: -180 }],
    [
      'margins longer than the run',
      { runLengthMm: 30, closed: false, motifWidthMm: 10, minScale: 0.9, maxScale: 1.1, endMarginMm: 20 },
    ],
    ['far too many repeats', { runLengthMm: 1e9, closed: true, motifWidthMm: 1, minScale: 0.9, maxScale: 1.1 }],
  ])('when given %s, then it fails with a reason instead of throwing', (_, input) => {
    const fit = fitBorder(input as BorderFitInput);
    expect(fit.ok).toBe(false);
    expect(!fit.ok && fit.reason.length).toBeGreaterThan(10);
  });

  it('property: a successful fit never runs past the run, meets it exactly, and stays within the scale limits', () => {
    fc.assert(
      fc.property(
        fc.record({
          runLengthMm: fc.double({ min: 10, max: 5000, noNaN: true }),
          closed: fc.boolean(),
          motifWidthMm: fc.double({ min: 5, max: 300, noNaN: true }),
          gapFraction: fc.double({ min: -0.5, max: 0.5, noNaN: true }),
          minScale: fc.double({ min: 0.5, max: 1, noNaN: true }),
          spread: fc.double({ min: 0, max: 0.6, noNaN: true }),
          endMarginMm: fc.double({ min: 0, max: 4, noNaN: true }),
          count: fc.option(fc.integer({ min: 1, max: 60 }), { nil: undefined }),
        }),
        ({ gapFraction, spread, ...rest }) => {
          const input = { ...rest, gapMm: gapFraction * rest.motifWidthMm, maxScale: rest.minScale + spread };
          const fit = fitBorder(input);
          if (!fit.ok) return;
          const tolerance = 1e-9 * input.runLengthMm;
          const margin = input.closed ? 0 : input.endMarginMm;
          const start = fit.centersMm[0] - fit.repeatWidthMm / 2;
          const end = fit.centersMm[fit.count - 1] + fit.repeatWidthMm / 2;
          expect(start).toBeGreaterThanOrEqual(margin - tolerance);
          expect(input.closed ? fit.count * fit.pitchMm : end).toBeLessThanOrEqual(
            input.runLengthMm - margin + tolerance,
          );
          expect(input.closed ? fit.count * fit.pitchMm : end - start).toBeCloseTo(input.runLengthMm - 2 * margin, 6);
          expect(fit.scale).toBeGreaterThanOrEqual(input.minScale * (1 - 1e-9));
          expect(fit.scale).toBeLessThanOrEqual(input.maxScale * (1 + 1e-9));
          expect(fit.count).toBeLessThanOrEqual(MAX_BORDER_REPEATS);
          if (input.count !== undefined) expect(fit.count).toBe(input.count);
        },
      ),
    );
  });
});
