import { describe, expect, it } from 'vitest';
import {
  findOverlaps,
  overlapDepthMm,
  overlappingIds,
  type PlacementOutline,
} from '../../../server/src/engine/placement-overlap.ts';

const box = (placementId: string, centerXMm: number, centerYMm: number, size = 30, rotationDeg = 0) => ({
  placementId,
  centerXMm,
  centerYMm,
  widthMm: size,
  heightMm: size,
  rotationDeg,
});

describe('overlapDepthMm', () => {
  it('when two 30 mm squares sit 20 mm apart centre to centre, then they overlap by 10 mm', () => {
    // Worked by hand: the left one spans 165–195 mm, the right one 185–215 mm; they share 185–195 mm.
    expect(overlapDepthMm(box('a', 180, 90), box('b', 200, 90))).toBe(10);
  });

  it('when two squares only touch along an edge, then they do not overlap', () => {
    expect(overlapDepthMm(box('a', 180, 90), box('b', 210, 90))).toBe(0);
  });

  it('when a square is turned 45° its corner reaches farther, then the depth follows the turned outline', () => {
    // A 20 mm square turned 45° reaches 10·√2 = 14.14 mm from its centre along x. With its centre 20 mm from the
    // side of an upright 20 mm square (10 mm beyond that square's own half width), it reaches 4.14 mm into it.
    const upright = { placementId: 'a', centerXMm: 0, centerYMm: 0, widthMm: 20, heightMm: 20, rotationDeg: 0 };
    const turned = { placementId: 'b', centerXMm: 20, centerYMm: 0, widthMm: 20, heightMm: 20, rotationDeg: 45 };
    expect(overlapDepthMm(upright, turned)).toBeCloseTo(4.14, 2);
    // Upright, the same square would only touch.
    expect(overlapDepthMm(upright, { ...turned, rotationDeg: 0 })).toBe(0);
  });

  it('when a turned square sits in the corner gap beside another, then they do not overlap', () => {
    // Diagonal neighbours: the gap between their corners is open even though their surrounding boxes overlap.
    const a = { placementId: 'a', centerXMm: 0, centerYMm: 0, widthMm: 20, heightMm: 20, rotationDeg: 45 };
    const b = { placementId: 'b', centerXMm: 16, centerYMm: 16, widthMm: 20, heightMm: 20, rotationDeg: 45 };
    expect(overlapDepthMm(a, b)).toBe(0);
  });
});

describe('findOverlaps', () => {
  it('when two motifs are stacked in the same place, then the pair is reported once with its depth', () => {
    expect(findOverlaps([box('motif', 180, 90), box('motif-2', 180, 90)])).toEqual([
      { firstId: 'motif', secondId: 'motif-2', depthMm: 30 },
    ]);
  });

  it('when outlines cross by less than half a millimetre, then they sew side by side and are not reported', () => {
    expect(findOverlaps([box('a', 180, 90), box('b', 209.6, 90)])).toEqual([]);
    expect(findOverlaps([box('a', 180, 90), box('b', 209, 90)])).toHaveLength(1);
  });

  it('when a name sits on two repeats of a border, then the border and the name are one pair, at the deeper repeat', () => {
    const outlines: PlacementOutline[] = [
      { placementId: 'border', centerXMm: 100, centerYMm: 400, widthMm: 40, heightMm: 20, rotationDeg: 0 },
      { placementId: 'border', centerXMm: 140, centerYMm: 400, widthMm: 40, heightMm: 20, rotationDeg: 0 },
      { placementId: 'name', centerXMm: 125, centerYMm: 405, widthMm: 30, heightMm: 12, rotationDeg: 0 },
    ];
    // Worked by hand: the name spans x 110–140 and y 399–411; both repeats span y 390–410, sharing 11 mm with it.
    // Repeat 1 (x 80–120) shares 10 mm across, so 10 mm the shallow way; repeat 2 (x 120–160) shares 20 mm, so 11.
    expect(findOverlaps(outlines)).toEqual([{ firstId: 'border', secondId: 'name', depthMm: 11 }]);
    expect(overlappingIds(findOverlaps(outlines))).toEqual(new Set(['border', 'name']));
  });

  it('when placements are clear of one another, then nothing is reported', () => {
    expect(findOverlaps([box('a', 150, 90), box('b', 210, 90), box('c', 180, 200)])).toEqual([]);
  });
});
