import { describe, expect, it } from 'vitest';
import type { BorderPlacement } from '../../../server/src/contracts/designs.ts';
import { layoutBorder } from '../../../storefront/src/features/designer/model/border-layout.ts';
import { setting, zone } from './support/bishop-dress-setting.ts';

const daisy = (fields: Partial<BorderPlacement> = {}): BorderPlacement => ({
  id: 'border',
  kind: 'border',
  zone: 'hem',
  motif: 'daisy-chain',
  run: 'circumference',
  hemOffsetMm: 44.45,
  threads: ['WB-118', 'WB-101', 'WB-103'],
  ...fields,
});

describe('border layout', () => {
  it('when the daisy chain goes all the way round the 6-month hem (692 mm), then fitBorder gives 4 repeats of 173 mm and the front shows 2', () => {
    // The trade's worked case (common practice, no source): 692 / 4 = 173 mm, 96.1 % of the 180 mm motif.
    const layout = layoutBorder(setting, 301, daisy());
    expect(layout.ok).toBe(true);
    if (!layout.ok) return;
    expect(layout.fit.count).toBe(4);
    expect(layout.fit.repeatWidthMm).toBeCloseTo(173, 9);
    expect(layout.fit.scale).toBeCloseTo(0.9611, 4);
    const hem = zone(0, 'hem');
    const middleXMm = hem.xMm + hem.widthMm / 2;
    // Repeats start at the back seam, so the front's middle is where the second and third repeats meet.
    expect(layout.repeats.map((repeat) => repeat.centerXMm - middleXMm)).toEqual([
      expect.closeTo(-86.5, 9),
      expect.closeTo(86.5, 9),
    ]);
    expect(layout.repeats[0]!.centerYMm).toBeCloseTo(hem.yMm + hem.heightMm - 44.45, 9);
    expect(layout.repeats[0]!.heightMm).toBeCloseTo(40 * (173 / 180), 9);
    expect(layout.band.widthMm).toBe(346);
  });

  it('when the daisy chain runs along the front panel only (346 mm), then both repeats of the open run show on the front', () => {
    const layout = layoutBorder(setting, 301, daisy({ run: 'front' }));
    expect(layout.ok && layout.fit.count).toBe(2);
    expect(layout.ok && layout.repeats.length).toBe(2);
    expect(layout.ok && layout.isClosed).toBe(false);
  });

  it('when the customer asked for a count, then that count is laid out', () => {
    const layout = layoutBorder(setting, 302, daisy({ count: 4 }));
    expect(layout.ok && layout.fit.count).toBe(4);
    expect(layout.ok && layout.fit.repeatWidthMm).toBeCloseTo(190, 9);
  });

  it('when no whole number of repeats fits the hem within the motif limits, then the engine says why', () => {
    const layout = layoutBorder(setting, 399, daisy());
    expect(layout.ok).toBe(false);
    if (layout.ok) return;
    expect(layout.reason).toBe('1 repeat need 138.9 % and 2 repeats need 69.4 %; this motif allows 90 % to 110 %.');
    expect(layout.bandHeightMm).toBe(40);
  });

  it('when the motif is no longer in the catalogue, then the layout says so instead of drawing', () => {
    const layout = layoutBorder(setting, 301, daisy({ motif: 'retired-border' }));
    expect(layout).toEqual({ ok: false, reason: 'This border is no longer offered; choose another.', bandHeightMm: 0 });
  });
});

describe('border layout on a curved hem', () => {
  // The 6-month bishop dress's hem zone (315.79 mm wide) with its ends rising 10 mm above the middle.
  const curved = {
    ...setting,
    garment: {
      ...setting.garment,
      sizes: setting.garment.sizes.map((size) => ({
        ...size,
        zones: size.zones.map((candidate) => (candidate.code === 'hem' ? { ...candidate, hemCurveMm: 10 } : candidate)),
      })),
    },
  };

  it('when repeats go along a hem that curves, then each sits its offset above the edge beneath it, turned to its slope', () => {
    const layout = layoutBorder(curved, 301, daisy());
    if (!layout.ok) throw new Error(layout.reason);
    const hem = zone(0, 'hem');
    const halfWidthMm = hem.widthMm / 2;
    const [left, right] = layout.repeats;
    // At u = ±86.5 / 157.9 the parabola rises 10·u² and slopes at atan(∓2·10·u / 157.9).
    const u = 86.5 / halfWidthMm;
    expect(left!.centerYMm).toBeCloseTo(hem.yMm + hem.heightMm - 44.45 - 10 * u * u, 9);
    expect(right!.centerYMm).toBeCloseTo(left!.centerYMm, 9);
    expect(right!.rotationDeg).toBeCloseTo((Math.atan((-2 * 10 * u) / halfWidthMm) * 180) / Math.PI, 9);
    expect(left!.rotationDeg).toBeCloseTo(-right!.rotationDeg, 9);
    expect(right!.rotationDeg).toBeLessThan(0);
    // The band covers the repeats and the rise, so the border is kept inside the zone at the ends too.
    expect(layout.band.heightMm).toBeCloseTo(40 * (173 / 180) + 10, 9);
  });

  it('when the hem is straight, then the repeats are level and upright', () => {
    const layout = layoutBorder(setting, 301, daisy());
    if (!layout.ok) throw new Error(layout.reason);
    expect(layout.repeats.map((repeat) => repeat.rotationDeg)).toEqual([0, 0]);
  });
});
