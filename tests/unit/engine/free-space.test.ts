import { describe, expect, it } from 'vitest';
import { findFreeCentre } from '../../../server/src/engine/free-space.ts';
import { findOverlaps } from '../../../server/src/engine/placement-overlap.ts';

/** The bubble romper's chest zone in its reference size (seeds/data/garments.ts): 100 × 60 mm from (130, 60). */
const chest = { xMm: 130, yMm: 60, widthMm: 100, heightMm: 60 };
const square = (placementId: string, centerXMm: number, centerYMm: number, size = 30) => ({
  placementId,
  centerXMm,
  centerYMm,
  widthMm: size,
  heightMm: size,
  rotationDeg: 0,
});

describe('findFreeCentre', () => {
  it('when the zone is empty, then the item goes in its centre', () => {
    expect(findFreeCentre({ zone: chest, extent: { widthMm: 30, heightMm: 30 }, others: [] })).toEqual({
      centerXMm: 180,
      centerYMm: 90,
      isFree: true,
    });
  });

  it('when a 30 mm motif fills the middle, then a second one goes in the middle of the free part beside it', () => {
    // Worked by hand: the first motif spans x 165–195 mm, leaving 35 mm free on each side (130–165, 195–230). A
    // 30 mm motif in the left part keeps 2.5 mm either side at x 147.5; on the 1 mm grid the nearest candidates,
    // 147 and 148 mm, keep 2 mm, and 148 is nearer the zone's centre. Up and down it stays on the centre line.
    const placed = findFreeCentre({
      zone: chest,
      extent: { widthMm: 30, heightMm: 30 },
      others: [square('m', 180, 90)],
    });
    expect(placed).toEqual({ centerXMm: 148, centerYMm: 90, isFree: true });
    expect(findOverlaps([square('m', 180, 90), square('m-2', placed.centerXMm, placed.centerYMm)])).toEqual([]);
  });

  it('when the first item sits to one side, then the new one goes in the larger free part', () => {
    // A 30 mm motif at x 150 (135–165) leaves 5 mm on its left and 65 mm (165–230) on its right: the new 30 mm
    // one goes in the 65 mm. On the centre line it keeps 15 mm from the zone's top and bottom, so every x keeping
    // at least 15 mm from the first motif and the right edge (195–200 mm) is as free; 195 is nearest the centre.
    const placed = findFreeCentre({
      zone: chest,
      extent: { widthMm: 30, heightMm: 30 },
      others: [square('m', 150, 90)],
    });
    expect(placed.isFree).toBe(true);
    expect(placed).toEqual({ centerXMm: 195, centerYMm: 90, isFree: true });
  });

  it('when the free part is above the first item, then the new item goes there', () => {
    // A wide name 90 × 20 mm at the bottom of the chest (y 100–120) leaves 40 mm above it: a 20 mm tall item goes
    // in the middle of that strip (60–100), y 80, keeping 10 mm above and below, on the centre line side to side.
    const name = { placementId: 'name', centerXMm: 180, centerYMm: 110, widthMm: 90, heightMm: 20, rotationDeg: 0 };
    expect(findFreeCentre({ zone: chest, extent: { widthMm: 20, heightMm: 20 }, others: [name] })).toEqual({
      centerXMm: 180,
      centerYMm: 80,
      isFree: true,
    });
  });

  it('when nothing in the zone is free, then the item is stacked in the centre and the answer says so', () => {
    const big = { placementId: 'big', centerXMm: 180, centerYMm: 90, widthMm: 100, heightMm: 60, rotationDeg: 0 };
    expect(findFreeCentre({ zone: chest, extent: { widthMm: 30, heightMm: 30 }, others: [big] })).toEqual({
      centerXMm: 180,
      centerYMm: 90,
      isFree: false,
    });
  });

  it('when the item is as wide as the zone, then it keeps the zone centre side to side and moves up or down', () => {
    const first = { placementId: 'a', centerXMm: 180, centerYMm: 70, widthMm: 100, heightMm: 20, rotationDeg: 0 };
    const placed = findFreeCentre({ zone: chest, extent: { widthMm: 100, heightMm: 20 }, others: [first] });
    // The first strip holds y 60–80; the free part is 80–120, whose middle for a 20 mm strip is y 100.
    expect(placed).toEqual({ centerXMm: 180, centerYMm: 100, isFree: true });
  });
});
