/**
 * Where a new item goes in its zone: in the largest free part of the zone that holds it, so it does not land on
 * what is already there. A simple scan: candidate centres on a grid at most `GRID_STEP_MM` apart, every one
 * keeping the item wholly inside the zone; a candidate is free when the item's box meets no other placement's box
 * (touching is allowed), and the free candidate farthest from everything (the zone's edges and the other
 * placements alike) is the middle of the largest free part. Ties go to the one nearest the zone's centre, then
 * to the first in reading order (top to bottom, left to right). When no candidate is free the item goes in the
 * zone's centre, stacked, and the answer says so: the overlap warning then shows.
 */
import type { PlacementOutline } from './placement-overlap.ts';

export interface ZoneRect {
  xMm: number;
  yMm: number;
  widthMm: number;
  heightMm: number;
}

export interface FreeCentre {
  centerXMm: number;
  centerYMm: number;
  /** False when nothing in the zone was free and the item is stacked in its centre. */
  isFree: boolean;
}

/** Candidates are never farther apart than this, mm, nor more than `MAX_STEPS` + 1 along an axis. */
export const GRID_STEP_MM = 1;
const MAX_STEPS = 120;

interface Box {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

const round2 = (value: number) => Math.round(value * 100) / 100;

/** The box round a turned outline, mm. */
function boxOf(outline: PlacementOutline): Box {
  const radians = (outline.rotationDeg * Math.PI) / 180;
  const cos = Math.abs(Math.cos(radians));
  const sin = Math.abs(Math.sin(radians));
  const halfW = (outline.widthMm * cos + outline.heightMm * sin) / 2;
  const halfH = (outline.widthMm * sin + outline.heightMm * cos) / 2;
  return {
    minX: outline.centerXMm - halfW,
    maxX: outline.centerXMm + halfW,
    minY: outline.centerYMm - halfH,
    maxY: outline.centerYMm + halfH,
  };
}

/** Centres along one axis that keep the item inside [start, start + length]; one, the middle, if it has no room. */
function positionsAlong(start: number, length: number, size: number): number[] {
  const slack = length - size;
  if (slack <= 0) return [round2(start + length / 2)];
  // An even number of steps, so the zone's middle is always a candidate.
  const steps = Math.min(MAX_STEPS, 2 * Math.ceil(slack / (2 * GRID_STEP_MM)));
  return Array.from({ length: steps + 1 }, (_, k) => round2(start + size / 2 + (slack * k) / steps));
}

/** The gap between two boxes, mm: 0 when they touch, negative (the shallower overlap) when they overlap. */
function gapBetween(a: Box, b: Box): number {
  const dx = Math.max(b.minX - a.maxX, a.minX - b.maxX);
  const dy = Math.max(b.minY - a.maxY, a.minY - b.maxY);
  if (dx < 0 && dy < 0) return Math.max(dx, dy);
  return Math.hypot(Math.max(dx, 0), Math.max(dy, 0));
}

/**
 * The centre for an item of this (turned) extent in a zone, mm on the mockup, clear of `others` (the outlines of
 * what is already on the garment) when the zone has room for it anywhere.
 */
export function findFreeCentre(input: {
  zone: ZoneRect;
  extent: { widthMm: number; heightMm: number };
  others: readonly PlacementOutline[];
}): FreeCentre {
  const { zone, extent } = input;
  const middle = { x: zone.xMm + zone.widthMm / 2, y: zone.yMm + zone.heightMm / 2 };
  const stacked = { centerXMm: round2(middle.x), centerYMm: round2(middle.y), isFree: false };
  const others = input.others.map(boxOf);
  const xs = positionsAlong(zone.xMm, zone.widthMm, extent.widthMm);
  const ys = positionsAlong(zone.yMm, zone.heightMm, extent.heightMm);
  // An axis without room has no edge gap to keep; only the axes the item can move along count.
  const hasRoomX = xs.length > 1;
  const hasRoomY = ys.length > 1;

  let best: { x: number; y: number; score: number; fromMiddle: number } | undefined;
  for (const y of ys) {
    for (const x of xs) {
      const box = {
        minX: x - extent.widthMm / 2,
        maxX: x + extent.widthMm / 2,
        minY: y - extent.heightMm / 2,
        maxY: y + extent.heightMm / 2,
      };
      let score = Infinity;
      if (hasRoomX) score = Math.min(score, box.minX - zone.xMm, zone.xMm + zone.widthMm - box.maxX);
      if (hasRoomY) score = Math.min(score, box.minY - zone.yMm, zone.yMm + zone.heightMm - box.maxY);
      for (const other of others) score = Math.min(score, gapBetween(box, other));
      if (score < 0) continue;
      score = round2(score);
      const fromMiddle = Math.hypot(x - middle.x, y - middle.y);
      const isBetter = !best || score > best.score || (score === best.score && fromMiddle < best.fromMiddle - 1e-9);
      if (isBetter) best = { x, y, score, fromMiddle };
    }
  }
  return best ? { centerXMm: best.x, centerYMm: best.y, isFree: true } : stacked;
}
