import { describe, expect, it } from 'vitest';
import {
  fitView,
  mm,
  pointToMm,
  pointToPx,
  px,
  toMm,
  toPx,
} from '../../../storefront/src/features/designer/model/view.ts';

describe('design view', () => {
  it('when the 6-month bishop dress (418.8 × 427.9 mm) is fitted to a 600 × 900 px box, then the width decides the scale', () => {
    const view = fitView(
      { widthMm: mm(460 * (346 / 380)), heightMm: mm(470 * (346 / 380)) },
      { widthPx: px(600), heightPx: px(900) },
    );
    expect(view.pxPerMm).toBeCloseTo(600 / 418.84, 3);
    expect(view.widthPx).toBe(600);
    expect(view.heightPx).toBe(Math.floor(470 * (346 / 380) * view.pxPerMm));
  });

  it('when the box is short, then the height decides the scale and the drawing stays to scale', () => {
    const view = fitView({ widthMm: mm(200), heightMm: mm(400) }, { widthPx: px(1000), heightPx: px(500) });
    expect(view.pxPerMm).toBe(1.25);
    expect([view.widthPx, view.heightPx]).toEqual([250, 500]);
  });

  it('when a length goes to pixels and back, then it is the same number of millimetres', () => {
    const view = fitView({ widthMm: mm(418.84), heightMm: mm(427.94) }, { widthPx: px(358), heightPx: px(2000) });
    expect(toMm(view, toPx(view, mm(173)))).toBeCloseTo(173, 9);
    expect(toPx(view, mm(10))).toBeCloseTo(10 * (358 / 418.84), 9);
    const point = pointToMm(view, pointToPx(view, { xMm: mm(230), yMm: mm(365.1) }));
    expect(point.xMm).toBeCloseTo(230, 9);
    expect(point.yMm).toBeCloseTo(365.1, 9);
  });

  it('when the container has no width yet, then nothing is drawn rather than dividing by zero', () => {
    const view = fitView({ widthMm: mm(460), heightMm: mm(470) }, { widthPx: px(0), heightPx: px(800) });
    expect(view).toEqual({ pxPerMm: 0, widthPx: 0, heightPx: 0 });
    expect(toMm(view, px(50))).toBe(0);
  });
});
