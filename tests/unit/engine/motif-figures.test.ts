import { describe, expect, it } from 'vitest';
import {
  apportionStitches,
  foldUnderlay,
  svgCanvasSizeMm,
  svgColoursInOrder,
} from '../../../server/src/engine/index.ts';

describe('foldUnderlay', () => {
  it('when there is underlay, then it is shared between satin and fill by their top stitches and the total stays', () => {
    expect(foldUnderlay({ run: 40, satin: 300, fill: 100, underlay: 80 })).toEqual({ run: 40, satin: 360, fill: 120 });
  });

  it('when there is only running stitch, then nothing is moved', () => {
    expect(foldUnderlay({ run: 40, satin: 0, fill: 0, underlay: 0 })).toEqual({ run: 40, satin: 0, fill: 0 });
  });
});

describe('apportionStitches', () => {
  it.each([
    [1000, { run: 1, satin: 1, fill: 1 }, { run: 334, satin: 333, fill: 333 }],
    [1200, { run: 0, satin: 0, fill: 900 }, { run: 0, satin: 0, fill: 1200 }],
    [7, { run: 10, satin: 20, fill: 70 }, { run: 1, satin: 1, fill: 5 }],
  ])('when %i stitches are split by %o, then the parts are %o and add up exactly', (total, shares, mix) => {
    const split = apportionStitches(total, shares);
    expect(split).toEqual({ ok: true, mix });
  });

  it('when the estimate has no stitches, then it asks for the mix', () => {
    expect(apportionStitches(100, { run: 0, satin: 0, fill: 0 })).toMatchObject({
      ok: false,
      reason: expect.stringMatching(/mix/),
    });
  });
});

describe('svgCanvasSizeMm', () => {
  it('when the file has mm width and height with a viewBox, then the canvas is that size', () => {
    expect(svgCanvasSizeMm('<svg width="180mm" height="40mm" viewBox="0 0 180 40"/>')).toEqual({
      ok: true,
      widthMm: 180,
      heightMm: 40,
      mmPerUnit: 1,
    });
  });

  it('when a width is asked for, then the viewBox is stretched to it, keeping its proportions', () => {
    expect(svgCanvasSizeMm('<svg viewBox="0 0 10 5"/>', { widthMm: 60 })).toEqual({
      ok: true,
      widthMm: 60,
      heightMm: 30,
      mmPerUnit: 6,
    });
  });

  it('when the file says nothing of its size, then it fails asking for a width', () => {
    expect(svgCanvasSizeMm('<svg viewBox="0 0 10 5"/>')).toMatchObject({
      ok: false,
      reason: expect.stringMatching(/width in millimetres/),
    });
  });
});

describe('svgColoursInOrder', () => {
  it('when shapes repeat colours, then each colour is listed once in the order it is first sewn', () => {
    const svg =
      '<svg viewBox="0 0 10 10"><rect width="1" height="1" fill="#FF0000" stroke="#00ff00"/><circle r="1" fill="red"/><path d="M0 0H1" stroke="#0000ff" fill="none"/></svg>';
    expect(svgColoursInOrder(svg)).toEqual({ ok: true, colours: ['#ff0000', '#00ff00', '#0000ff'] });
  });
});
