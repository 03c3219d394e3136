import { describe, expect, it } from 'vitest';
import { canRedo, canUndo } from '../../../storefront/src/features/designer/model/history.ts';
import { MAX_PLACEMENTS } from '../../../storefront/src/features/designer/model/designer-state.ts';
import { freshHistory, only, placementsOf, press, run } from './support/run.ts';
import { zone } from './support/bishop-dress-setting.ts';

const withName = (text = 'Eliza') =>
  run(freshHistory(), 'add-lettering', { text, font: 'breezy-script', letterHeightMm: 20, thread: 'WB-110' });

describe('adding placements', () => {
  it('when a name is added, then it sits in the middle of the first zone that is not the hem, selected, in one undo step', () => {
    const history = withName();
    const chest = zone(0, 'chest');
    expect(only(history, 'name')).toMatchObject({
      kind: 'lettering',
      zone: 'chest',
      centerXMm: expect.closeTo(chest.xMm + chest.widthMm / 2, 2),
      centerYMm: expect.closeTo(chest.yMm + chest.heightMm / 2, 2),
      text: 'Eliza',
      letterHeightMm: 20,
    });
    expect(history.present.selectedId).toBe('name');
    expect(history.past).toHaveLength(1);
  });

  it('when a second name is added, then it gets its own id', () => {
    const history = run(withName(), 'add-lettering', {
      text: 'Rose',
      font: 'breezy-script',
      letterHeightMm: 12,
      thread: 'WB-110',
    });
    expect(placementsOf(history).map((placement) => placement.id)).toEqual(['name', 'name-2']);
  });

  it('when the lettering is blank, too long or the letters too tall for the font, then the contract is kept', () => {
    expect(
      run(freshHistory(), 'add-lettering', { text: '  ', font: 'breezy-script', letterHeightMm: 20, thread: 'WB-110' })
        .past,
    ).toHaveLength(0);
    expect(
      run(freshHistory(), 'add-lettering', {
        text: 'x'.repeat(41),
        font: 'breezy-script',
        letterHeightMm: 20,
        thread: 'WB-110',
      }).past,
    ).toHaveLength(0);
    const tall = run(freshHistory(), 'add-lettering', {
      text: 'Eli',
      font: 'breezy-script',
      letterHeightMm: 90,
      thread: 'WB-110',
    });
    expect(only(tall, 'name')).toMatchObject({ letterHeightMm: 60 });
  });

  it('when the daisy border is added, then it runs along the hem at the zone’s offset in the motif’s threads, and a second border is refused', () => {
    const history = run(freshHistory(), 'add-border', { motif: 'daisy-chain', run: 'circumference' });
    expect(only(history, 'border')).toEqual({
      id: 'border',
      kind: 'border',
      zone: 'hem',
      motif: 'daisy-chain',
      run: 'circumference',
      hemOffsetMm: 44.45,
      threads: ['WB-118', 'WB-101', 'WB-103'],
    });
    expect(run(history, 'add-border', { motif: 'daisy-chain', run: 'front' })).toBe(history);
  });

  it('when a motif is added beyond its limits, then its size is kept within them', () => {
    const history = run(freshHistory(), 'add-motif', { motif: 'sitting-bunny', scalePct: 150 });
    expect(only(history, 'motif')).toMatchObject({ scalePct: 120, zone: 'chest' });
  });

  it('when the design already holds the most placements the contract allows, then nothing more is added', () => {
    let history = freshHistory();
    for (let i = 0; i < MAX_PLACEMENTS + 2; i += 1)
      history = run(history, 'add-motif', { motif: 'sitting-bunny', scalePct: 80 });
    expect(placementsOf(history)).toHaveLength(MAX_PLACEMENTS);
  });
});

describe('moving placements', () => {
  it('when a name is dragged past the edge of its zone, then the document keeps it inside, and the drag makes no undo entry', () => {
    const history = run(withName(), 'drag-placement', { id: 'name', centerXMm: 0, centerYMm: 1000 });
    const chest = zone(0, 'chest');
    const widthMm = 5 * 20 * 0.6;
    const heightMm = 20 * 1.3;
    expect(only(history, 'name')).toMatchObject({
      centerXMm: Math.round((chest.xMm + widthMm / 2) * 100) / 100,
      centerYMm: Math.round((chest.yMm + chest.heightMm - heightMm / 2) * 100) / 100,
    });
    expect(history.past).toHaveLength(1);
  });

  it('when a drag ends, then the whole drag is one undo entry back to where it started', () => {
    const start = withName();
    let history = run(start, 'drag-placement', { id: 'name', centerXMm: 200, centerYMm: 100 });
    history = run(history, 'drag-placement', { id: 'name', centerXMm: 215, centerYMm: 105 });
    history = run(history, 'move-placement', { id: 'name', centerXMm: 216, centerYMm: 105 });
    expect(history.past).toHaveLength(2);
    expect(only(history, 'name')).toMatchObject({ centerXMm: 216, centerYMm: 105 });
    history = run(history, 'undo', undefined);
    expect(only(history, 'name')).toEqual(only(start, 'name'));
    history = run(history, 'redo', undefined);
    expect(only(history, 'name')).toMatchObject({ centerXMm: 216, centerYMm: 105 });
  });

  it('when the arrow keys nudge the selected name, then it moves 1 mm, or 10 mm with Shift', () => {
    const start = withName();
    const { centerXMm, centerYMm } = only(start, 'name') as { centerXMm: number; centerYMm: number };
    let history = press(start, 'ArrowRight');
    expect(only(history, 'name')).toMatchObject({ centerXMm: centerXMm + 1, centerYMm });
    history = press(history, 'ArrowLeft', { shift: true });
    expect(only(history, 'name')).toMatchObject({ centerXMm: centerXMm - 9, centerYMm });
    expect(history.past).toHaveLength(3);
  });

  it('when a nudge would leave the zone, then the name stops at the edge and no empty undo entry is made', () => {
    let history = withName();
    for (let i = 0; i < 10; i += 1) history = press(history, 'ArrowLeft', { shift: true });
    const atEdge = history;
    history = press(history, 'ArrowLeft');
    expect(history.present).toBe(atEdge.present);
    expect(history.past).toHaveLength(atEdge.past.length);
  });

  it('when the border is nudged, then only its height above the hem changes, and it stays in the hem zone', () => {
    let history = run(freshHistory(), 'add-border', { motif: 'daisy-chain', run: 'circumference' });
    history = press(history, 'ArrowUp');
    expect(only(history, 'border')).toMatchObject({ hemOffsetMm: 45.45 });
    history = press(history, 'ArrowLeft');
    expect(only(history, 'border')).toMatchObject({ hemOffsetMm: 45.45 });
    for (let i = 0; i < 20; i += 1) history = press(history, 'ArrowUp', { shift: true });
    const hem = zone(0, 'hem');
    expect(only(history, 'border')).toMatchObject({
      hemOffsetMm: Math.round((hem.heightMm - (40 * 173) / 180 / 2) * 100) / 100,
    });
  });
});

describe('keeping items inside their zone', () => {
  it('when the name is pushed to an edge and then given taller letters, then it is moved back inside', () => {
    let history = withName();
    for (let i = 0; i < 10; i += 1) history = press(history, 'ArrowRight', { shift: true });
    history = run(history, 'update-lettering', { id: 'name', letterHeightMm: 24 });
    const chest = zone(0, 'chest');
    const widthMm = 5 * 24 * 0.6;
    expect(only(history, 'name')).toMatchObject({
      letterHeightMm: 24,
      centerXMm: Math.round((chest.xMm + chest.widthMm - widthMm / 2) * 100) / 100,
    });
  });

  it('when an item is bigger than its zone, then it is centred in it', () => {
    const history = run(freshHistory(), 'add-lettering', {
      text: 'Elizabeth Rose',
      font: 'breezy-script',
      letterHeightMm: 30,
      thread: 'WB-110',
    });
    const chest = zone(0, 'chest');
    expect(only(history, 'name')).toMatchObject({ centerXMm: Math.round((chest.xMm + chest.widthMm / 2) * 100) / 100 });
  });

  it('when a name moves to another zone, then it starts from that zone’s middle', () => {
    const history = run(withName(), 'update-lettering', { id: 'name', zone: 'hem' });
    const hem = zone(0, 'hem');
    expect(only(history, 'name')).toMatchObject({
      zone: 'hem',
      centerXMm: expect.closeTo(hem.xMm + hem.widthMm / 2, 1),
      centerYMm: expect.closeTo(hem.yMm + hem.heightMm / 2, 1),
    });
  });
});

describe('removing, undo and redo', () => {
  it('when Delete is pressed, then the selected placement goes, and undo brings it back selected', () => {
    const start = withName();
    let history = press(start, 'Delete');
    expect(placementsOf(history)).toEqual([]);
    expect(history.present.selectedId).toBeNull();
    history = press(history, 'z', { ctrl: true });
    expect(placementsOf(history)).toEqual(placementsOf(start));
    expect(history.present.selectedId).toBe('name');
    history = press(history, 'Z', { ctrl: true, shift: true });
    expect(placementsOf(history)).toEqual([]);
    expect(canRedo(history)).toBe(false);
  });

  it('when there is nothing to undo or redo, then the history is left as it is', () => {
    const history = freshHistory();
    expect(canUndo(history)).toBe(false);
    expect(run(history, 'undo', undefined)).toBe(history);
    expect(run(history, 'redo', undefined)).toBe(history);
  });

  it('when a name is typed letter by letter, then undo takes back the typing in one step', () => {
    let history = withName('E');
    for (const text of ['El', 'Eli', 'Eliz', 'Eliza']) history = run(history, 'update-lettering', { id: 'name', text });
    expect(history.past).toHaveLength(2);
    history = run(history, 'undo', undefined);
    expect(only(history, 'name')).toMatchObject({ text: 'E' });
  });

  it('when a new edit follows an undo, then the undone step can no longer be redone', () => {
    let history = run(press(withName(), 'ArrowRight'), 'undo', undefined);
    expect(canRedo(history)).toBe(true);
    history = press(history, 'ArrowDown');
    expect(canRedo(history)).toBe(false);
  });

  it('when selecting, then no undo entry is made, and undo after an edit does not take the selection back alone', () => {
    let history = run(withName(), 'add-motif', { motif: 'sitting-bunny', scalePct: 100 });
    history = run(history, 'select-placement', { id: 'name' });
    expect(history.past).toHaveLength(2);
    history = press(history, 'ArrowRight');
    history = run(history, 'undo', undefined);
    expect(history.present.selectedId).toBe('name');
    expect(press(history, 'Escape').present.selectedId).toBeNull();
  });
});

describe('size and colour', () => {
  it('when the size changes, then a name keeps its place relative to its zone and a border drops its recorded fit', () => {
    let history = run(withName(), 'add-border', { motif: 'daisy-chain', run: 'circumference' });
    history = run(history, 'change-size', { sizeId: 302 });
    expect(history.present.sizeId).toBe(302);
    const chest = zone(1, 'chest');
    expect(only(history, 'name')).toMatchObject({
      centerXMm: expect.closeTo(chest.xMm + chest.widthMm / 2, 1),
      centerYMm: expect.closeTo(chest.yMm + chest.heightMm / 2, 1),
    });
    expect(only(history, 'border')).not.toHaveProperty('count');
    history = run(history, 'undo', undefined);
    expect(history.present.sizeId).toBe(301);
  });

  it('when the fabric colour changes, then it is one undo step; an unknown colour is ignored', () => {
    const history = run(freshHistory(), 'set-fabric-colour', { colourId: 302 });
    expect(history.present.colourId).toBe(302);
    expect(history.past).toHaveLength(1);
    expect(run(history, 'set-fabric-colour', { colourId: 999 })).toBe(history);
  });
});
