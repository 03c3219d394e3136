import { describe, expect, it } from 'vitest';
import { describeDeltaE, offerNearestThreads } from '../../../storefront/src/features/designer/model/thread-match.ts';
import { motifScaleRange } from '../../../storefront/src/features/designer/model/motif-rules.ts';
import { largestFactorInHoops } from '../../../storefront/src/features/designer/model/hoop-limit.ts';
import { freshHistory, only, press, run } from './support/run.ts';
import { setting, sittingBunny, zone } from './support/bishop-dress-setting.ts';

const withDrawing = () => run(freshHistory(), 'add-artwork', { artworkUploadId: 41 });
const withBunny = () => run(freshHistory(), 'add-motif', { motif: 'sitting-bunny', scalePct: 100 });

describe('the customer’s own artwork', () => {
  it('when a drawing is added, then it is centred in the first zone that is not the hem, 60 mm wide, selected', () => {
    const history = withDrawing();
    const chest = zone(0, 'chest');
    expect(only(history, 'artwork')).toEqual({
      id: 'artwork',
      kind: 'artwork',
      zone: 'chest',
      centerXMm: expect.closeTo(chest.xMm + chest.widthMm / 2, 2),
      centerYMm: expect.closeTo(chest.yMm + chest.heightMm / 2, 2),
      rotationDeg: 0,
      artworkUploadId: 41,
      widthMm: 60,
    });
    expect(history.present.selectedId).toBe('artwork');
  });

  it('when an upload the setting does not know is added, then nothing changes', () => {
    const history = freshHistory();
    expect(run(history, 'add-artwork', { artworkUploadId: 999 })).toBe(history);
  });

  it('when the drawing is made wider than its zone allows, then its width stops where its height fills the zone', () => {
    // The 6-month chest zone is 91.05 × 45.53 mm; a 2:1 drawing fills its height at 91.05 mm wide, so it stops at 91.0.
    const history = run(withDrawing(), 'update-artwork', { id: 'artwork', widthMm: 150 });
    expect(only(history, 'artwork')).toMatchObject({ widthMm: 91 });
    expect(only(run(history, 'update-artwork', { id: 'artwork', widthMm: 1 }), 'artwork')).toMatchObject({
      widthMm: 5,
    });
  });

  it('when a square scan goes on the wide hem, then the hem’s height limits it, and the largest hoop would limit a wider zone', () => {
    let history = run(freshHistory(), 'add-artwork', { artworkUploadId: 42, zone: 'hem' });
    history = run(history, 'update-artwork', { id: 'artwork', widthMm: 400 });
    expect(only(history, 'artwork')).toMatchObject({ zone: 'hem', widthMm: 91 });
    // The 200 × 300 mm field less its 3 mm clearance at each edge is 194 × 294 mm: a square fits up to 194 mm, a
    // 2:1 drawing up to 294 mm (turned in the hoop).
    expect(largestFactorInHoops({ widthMm: 1, heightMm: 1 }, setting.hoops)).toBe(194);
    expect(largestFactorInHoops({ widthMm: 1, heightMm: 0.5 }, setting.hoops)).toBe(294);
  });

  it('when a resize is repeated, then it is one step to undo', () => {
    let history = withDrawing();
    for (const widthMm of [61, 62, 63]) history = run(history, 'update-artwork', { id: 'artwork', widthMm });
    expect(only(run(history, 'undo', undefined), 'artwork')).toMatchObject({ widthMm: 60 });
  });
});

describe('turning, centring and snapping', () => {
  it('when R is pressed twice and Shift+R once, then the selected item is turned 15° clockwise, and a turn past 180° reads as anticlockwise', () => {
    let history = withBunny();
    history = press(press(press(history, 'r'), 'r'), 'R', { shift: true });
    expect(only(history, 'motif')).toMatchObject({ rotationDeg: 15 });
    expect(only(run(history, 'rotate-placement', { id: 'motif', toDeg: 270 }), 'motif')).toMatchObject({
      rotationDeg: -90,
    });
  });

  it('when a border is asked to turn, then nothing changes: it follows the hem', () => {
    const history = run(freshHistory(), 'add-border', { motif: 'daisy-chain', run: 'circumference' });
    expect(run(history, 'rotate-placement', { id: 'border', byDeg: 15 })).toBe(history);
  });

  it('when an item is dragged to within 3 mm of its zone’s centre line, then it lands on the line; 4 mm away it does not', () => {
    const chest = zone(0, 'chest');
    const middle = chest.xMm + chest.widthMm / 2;
    const near = run(withBunny(), 'move-placement', {
      id: 'motif',
      centerXMm: middle + 2.9,
      centerYMm: chest.yMm + 20,
    });
    expect(only(near, 'motif')).toMatchObject({ centerXMm: Math.round(middle * 100) / 100 });
    const far = run(withBunny(), 'move-placement', { id: 'motif', centerXMm: middle + 4, centerYMm: chest.yMm + 20 });
    expect((only(far, 'motif') as { centerXMm: number }).centerXMm).toBeCloseTo(middle + 4, 2);
  });

  it('when C is pressed, then the selected item goes to its zone’s centre line, keeping its height', () => {
    const chest = zone(0, 'chest');
    let history = run(withBunny(), 'nudge-placement', { id: 'motif', dxMm: 10, dyMm: 0 });
    history = press(history, 'c');
    expect(only(history, 'motif')).toMatchObject({
      centerXMm: Math.round((chest.xMm + chest.widthMm / 2) * 100) / 100,
    });
  });
});

describe('thread colours', () => {
  it('when the second colour of the border is set, then only that thread changes', () => {
    const history = run(
      run(freshHistory(), 'add-border', { motif: 'daisy-chain', run: 'front' }),
      'set-thread-colour',
      { id: 'border', index: 1, thread: 'WB-140' },
    );
    expect(only(history, 'border')).toMatchObject({ threads: ['WB-118', 'WB-140', 'WB-103'] });
  });

  it('when a colour index is out of range, then nothing changes', () => {
    const history = withBunny();
    expect(run(history, 'set-thread-colour', { id: 'motif', index: 3, thread: 'WB-140' })).toBe(history);
  });

  it('when a name’s thread is set, then the lettering takes it', () => {
    const history = run(
      run(freshHistory(), 'add-lettering', {
        text: 'Ada',
        font: 'breezy-script',
        letterHeightMm: 20,
        thread: 'WB-110',
      }),
      'set-thread-colour',
      { id: 'name', index: 0, thread: 'WB-118' },
    );
    expect(only(history, 'name')).toMatchObject({ thread: 'WB-118' });
  });

  it('when a colour of one’s own is picked, then the nearest threads come back nearest first, with the difference in words', () => {
    const palette = [
      { code: 'A', name: 'Rose', hex: '#F4A6C0' },
      { code: 'B', name: 'Blush', hex: '#F2B5C8' },
      { code: 'C', name: 'Navy', hex: '#1F2A44' },
      { code: 'D', name: 'Moss', hex: '#6B8E23' },
    ];
    const offers = offerNearestThreads('#f4a6c0', palette);
    expect(offers.map((offer) => offer.thread.code)).toEqual(['A', 'B', 'D']);
    expect(offers[0]).toMatchObject({ deltaE: 0, words: 'no visible difference' });
    expect(offerNearestThreads('not a colour', palette)).toEqual([]);
  });

  it('when ΔE is read in words, then the bands are as the panel promises (common practice, no source)', () => {
    expect([0.4, 1, 1.9, 2, 5, 5.1, 30].map(describeDeltaE)).toEqual([
      'no visible difference',
      'only seen up close',
      'only seen up close',
      'a slight difference side by side',
      'a slight difference side by side',
      'clearly a different colour',
      'clearly a different colour',
    ]);
  });
});

describe('motif sizes and border repeats', () => {
  it('when the largest hoop is smaller than the motif file allows, then the hoop sets the top of the range', () => {
    expect(motifScaleRange(sittingBunny, setting.hoops)).toEqual({ minPct: 80, maxPct: 120, isHoopLimited: false });
    const smallHoops = [{ slug: 'tiny', name: 'Tiny', fieldWidthMm: 40, fieldHeightMm: 80, clearanceMm: 0 }];
    // 36 × 71 mm fits 40 × 80 up to 40 / 36 = 111.1 % (its height would allow 112.7 %).
    expect(motifScaleRange(sittingBunny, smallHoops)).toEqual({ minPct: 80, maxPct: 111, isHoopLimited: true });
  });

  it('when one fewer repeat is asked of the 692 mm loop, then the count is kept and the engine refits the border', () => {
    let history = run(freshHistory(), 'add-border', { motif: 'daisy-chain', run: 'circumference' });
    history = run(history, 'update-border', { id: 'border', count: 3 });
    expect(only(history, 'border')).toMatchObject({ count: 3 });
    expect(run(history, 'update-border', { id: 'border', count: 0 })).toBe(history);
  });
});
