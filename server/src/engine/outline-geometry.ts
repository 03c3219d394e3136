/**
 * Outlines as straight pieces: flattening curves, then length, area and extent of the result. Coordinates are
 * whatever the caller scaled them to (mm everywhere in the engine).
 */

/** One absolute outline command, in the shape opentype.js uses for glyph paths (SVG paths are converted to it). */
export type OutlineCommand =
  | { type: 'M'; x: number; y: number }
  | { type: 'L'; x: number; y: number }
  | { type: 'C'; x1: number; y1: number; x2: number; y2: number; x: number; y: number }
  | { type: 'Q'; x1: number; y1: number; x: number; y: number }
  | { type: 'Z' };

/** A flattened subpath: `points` holds x0, y0, x1, y1, … */
export interface Polyline {
  points: number[];
  /** Ended with a close command; a fill treats every subpath as closed anyway. */
  isClosed: boolean;
}

export type FillRule = 'nonzero' | 'evenodd';

export interface Extent {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** A curve is never cut into more pieces than this, whatever its size, so one huge curve cannot stall a request. */
const MAX_PIECES_PER_CURVE = 256;

/**
 * Takes outline commands one by one and replaces curves by straight pieces no farther than `toleranceMm` from the
 * curve, writing straight into each subpath's point list, so a long path is flattened without a list of command
 * objects in between. The piece count comes from the standard bound for uniform subdivision: deviation ≤
 * (1/8)·max|B''|/n², with |B''| ≤ 6·(largest second difference of the control points) for a cubic and
 * 2·(second difference) for a quadratic.
 */
export function createOutlineFlattener(toleranceMm: number) {
  const polylines: Polyline[] = [];
  let current: number[] | undefined;
  let currentPolyline: Polyline | undefined;
  let x = 0;
  let y = 0;
  let startX = 0;
  let startY = 0;
  const begin = (): number[] => {
    if (!current) {
      current = [x, y];
      currentPolyline = { points: current, isClosed: false };
      polylines.push(currentPolyline);
    }
    return current;
  };
  return {
    moveTo(toX: number, toY: number): void {
      current = undefined;
      x = startX = toX;
      y = startY = toY;
    },
    lineTo(toX: number, toY: number): void {
      begin().push(toX, toY);
      x = toX;
      y = toY;
    },
    cubicTo(x1: number, y1: number, x2: number, y2: number, toX: number, toY: number): void {
      const points = begin();
      const bend = Math.max(
        Math.hypot(x - 2 * x1 + x2, y - 2 * y1 + y2),
        Math.hypot(x1 - 2 * x2 + toX, y1 - 2 * y2 + toY),
      );
      const pieces = pieceCount((0.75 * bend) / toleranceMm);
      for (let i = 1; i <= pieces; i += 1) {
        const t = i / pieces;
        const u = 1 - t;
        const a = u * u * u;
        const b = 3 * u * u * t;
        const c = 3 * u * t * t;
        const d = t * t * t;
        points.push(a * x + b * x1 + c * x2 + d * toX, a * y + b * y1 + c * y2 + d * toY);
      }
      x = toX;
      y = toY;
    },
    quadTo(x1: number, y1: number, toX: number, toY: number): void {
      const points = begin();
      const pieces = pieceCount((0.25 * Math.hypot(x - 2 * x1 + toX, y - 2 * y1 + toY)) / toleranceMm);
      for (let i = 1; i <= pieces; i += 1) {
        const t = i / pieces;
        const u = 1 - t;
        points.push(u * u * x + 2 * u * t * x1 + t * t * toX, u * u * y + 2 * u * t * y1 + t * t * toY);
      }
      x = toX;
      y = toY;
    },
    close(): void {
      if (currentPolyline) currentPolyline.isClosed = true;
      current = currentPolyline = undefined;
      x = startX;
      y = startY;
    },
    /** The subpaths with at least one piece. */
    finish(): Polyline[] {
      return polylines.filter((polyline) => polyline.points.length >= 4);
    },
  };
}

/** Flattens a list of outline commands (see `createOutlineFlattener`). */
export function flattenOutline(commands: readonly OutlineCommand[], toleranceMm: number): Polyline[] {
  const flattener = createOutlineFlattener(toleranceMm);
  for (const command of commands) {
    if (command.type === 'M') flattener.moveTo(command.x, command.y);
    else if (command.type === 'L') flattener.lineTo(command.x, command.y);
    else if (command.type === 'C')
      flattener.cubicTo(command.x1, command.y1, command.x2, command.y2, command.x, command.y);
    else if (command.type === 'Q') flattener.quadTo(command.x1, command.y1, command.x, command.y);
    else flattener.close();
  }
  return flattener.finish();
}

function pieceCount(ratio: number): number {
  const pieces = Math.ceil(Math.sqrt(ratio));
  return Number.isFinite(pieces) ? Math.min(MAX_PIECES_PER_CURVE, Math.max(1, pieces)) : MAX_PIECES_PER_CURVE;
}

/** Length along the polyline; `asClosed` adds the piece back to the start (a fill's outline). */
export function polylineLength(polyline: Polyline, asClosed = polyline.isClosed): number {
  const p = polyline.points;
  let length = 0;
  for (let i = 2; i < p.length; i += 2) length += Math.hypot(p[i] - p[i - 2], p[i + 1] - p[i - 1]);
  if (asClosed) length += Math.hypot(p[0] - p[p.length - 2], p[1] - p[p.length - 1]);
  return length;
}

/** Shoelace formula (Gauss's area formula); the sign follows the winding direction. */
export function signedArea(points: readonly number[]): number {
  let twiceArea = 0;
  for (let i = 0; i < points.length; i += 2) {
    const j = (i + 2) % points.length;
    twiceArea += points[i] * points[j + 1] - points[j] * points[i + 1];
  }
  return twiceArea / 2;
}

/**
 * Area painted by a fill of several subpaths. Each subpath's parent is the smallest larger subpath containing
 * its first point; a subpath adds or removes its own area as the region inside it is painted or not, relative
 * to its parent's region. Under `nonzero` a region is painted when the windings of it and its ancestors do not
 * cancel; under `evenodd` when it is nested an odd number of times. Exact for subpaths that nest without crossing.
 */
export function filledArea(polylines: readonly Polyline[], fillRule: FillRule): number {
  const rings = polylines
    .map((polyline) => ({ polyline, area: signedArea(polyline.points), extent: extentOf([polyline]) }))
    .sort((a, b) => Math.abs(b.area) - Math.abs(a.area));
  const winding: number[] = [];
  const depth: number[] = [];
  let total = 0;
  rings.forEach((ring, i) => {
    const [px, py] = ring.polyline.points;
    let parent = -1;
    for (let j = i - 1; j >= 0 && parent < 0; j -= 1) {
      if (contains(rings[j].extent, px, py) && isInside(rings[j].polyline.points, px, py)) parent = j;
    }
    winding[i] = (parent >= 0 ? winding[parent] : 0) + Math.sign(ring.area);
    depth[i] = (parent >= 0 ? depth[parent] : 0) + 1;
    const isPainted = (k: number) => (k < 0 ? false : fillRule === 'evenodd' ? depth[k] % 2 === 1 : winding[k] !== 0);
    total += (Number(isPainted(i)) - Number(isPainted(parent))) * Math.abs(ring.area);
  });
  return Math.max(0, total);
}

/** Even-odd ray test of a point against a closed polygon. */
function isInside(points: readonly number[], px: number, py: number): boolean {
  let inside = false;
  for (let i = 0, j = points.length - 2; i < points.length; j = i, i += 2) {
    const xi = points[i];
    const yi = points[i + 1];
    const xj = points[j];
    const yj = points[j + 1];
    if (yi > py !== yj > py && px < ((xj - xi) * (py - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

function contains(extent: Extent | undefined, x: number, y: number): boolean {
  return extent !== undefined && x >= extent.minX && x <= extent.maxX && y >= extent.minY && y <= extent.maxY;
}

/** The smallest axis-aligned box around all points, or `undefined` when there are none. */
export function extentOf(polylines: readonly Polyline[]): Extent | undefined {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const { points } of polylines) {
    for (let i = 0; i < points.length; i += 2) {
      if (points[i] < minX) minX = points[i];
      if (points[i] > maxX) maxX = points[i];
      if (points[i + 1] < minY) minY = points[i + 1];
      if (points[i + 1] > maxY) maxY = points[i + 1];
    }
  }
  return minX <= maxX ? { minX, minY, maxX, maxY } : undefined;
}

/** Merges extents, skipping missing ones. */
export function unionExtent(a: Extent | undefined, b: Extent | undefined): Extent | undefined {
  if (!a || !b) return a ?? b;
  return {
    minX: Math.min(a.minX, b.minX),
    minY: Math.min(a.minY, b.minY),
    maxX: Math.max(a.maxX, b.maxX),
    maxY: Math.max(a.maxY, b.maxY),
  };
}
