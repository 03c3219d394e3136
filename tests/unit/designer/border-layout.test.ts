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
    expect(layout.repeats.map((repeat) => repeat.centerXMm - middleXMm)).toEqual([expect.closeTo(-86.5, 9), expect.closeTo(86.5, 9)]);
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
