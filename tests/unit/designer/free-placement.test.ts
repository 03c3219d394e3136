import { describe, expect, it } from 'vitest';
import { designOverlaps } from '../../../storefront/src/features/designer/model/placement-outlines.ts';
import { setting, zone } from './support/bishop-dress-setting.ts';
import { freshHistory, only, run } from './support/run.ts';
import type { DesignerHistory } from '../../../storefront/src/features/designer/model/history.ts';

const addBunny = (history: DesignerHistory) => run(history, 'add-motif', { motif: 'sitting-bunny', scalePct: 80 });
const overlapsOf = (history: DesignerHistory) => designOverlaps(setting, history.present);

describe('placing new items in free space', () => {
  it('when two motifs are added to the same zone, then the second goes beside the first and they do not overlap', () => {
    // The 6-month chest is 91.05 mm wide from x 163.89; a bunny at 80 % is 28.8 mm wide. The first goes in the
    // middle (209.42); the second in the middle of a free part beside it.
    const history = addBunny(addBunny(freshHistory()));
    const chest = zone(0, 'chest');
    expect(only(history, 'motif')).toMatchObject({ centerXMm: expect.closeTo(chest.xMm + chest.widthMm / 2, 1) });
    const second = only(history, 'motif-2') as { centerXMm: number; zone: string };
    expect(second.zone).toBe('chest');
    expect(Math.abs(second.centerXMm - (chest.xMm + chest.widthMm / 2))).toBeGreaterThanOrEqual(28.8);
    expect(overlapsOf(history)).toEqual([]);
  });

  it('when the zone has no room left, then the new motif is stacked and the overlap is found', () => {
    let history = freshHistory();
    for (let i = 0; i < 4; i += 1) history = addBunny(history);
    // Four bunnies (4 × 28.8 = 115.2 mm) cannot stand side by side in 91.05 mm: the last lands on another.
    expect(overlapsOf(history).some((overlap) => overlap.secondId === 'motif-4')).toBe(true);
  });

  it('when a name is dragged onto a motif, then the pair is reported; dragged away again, it is not', () => {
    let history = addBunny(
      run(freshHistory(), 'add-lettering', {
        text: 'Ada',
        font: 'breezy-script',
        letterHeightMm: 12,
        thread: 'WB-110',
      }),
    );
    expect(overlapsOf(history)).toEqual([]);
    const bunny = only(history, 'motif') as { centerXMm: number; centerYMm: number };
    history = run(history, 'move-placement', { id: 'name', centerXMm: bunny.centerXMm, centerYMm: bunny.centerYMm });
    expect(overlapsOf(history)).toEqual([expect.objectContaining({ firstId: 'name', secondId: 'motif' })]);
  });
});
