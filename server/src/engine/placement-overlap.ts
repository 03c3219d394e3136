/**
 * When two placements would be stitched over each other. Every placement is described by its outlines on the
 * mockup, mm: turned rectangles (a name, a motif or a picture is one; a border is one per repeat that shows on the
 * front). Two placements overlap when an outline of one covers an outline of the other by more than
 * `MIN_OVERLAP_MM`, measured the shallow way through (the separating-axis test on the two rectangles).
 */

/** One turned rectangle of a placement, mm on the mockup; several outlines may share a placement id. */
export interface PlacementOutline {
  placementId: string;
  centerXMm: number;
  centerYMm: number;
  widthMm: number;
  heightMm: number;
  /** Clockwise, degrees, about the centre. */
  rotationDeg: number;
}

/** Two placements stitched over each other, by how far they overlap at the shallowest, mm. */
export interface PlacementOverlap {
  firstId: string;
  secondId: string;
  depthMm: number;
}

/**
 * Half a millimetre is about a satin stitch's own spread at its edge: outlines touching or crossing by less than
 * that sew side by side, not on top (common practice, no source).
 */
export const MIN_OVERLAP_MM = 0.5;

type Point = { x: number; y: number };

/** An outline with what the test needs worked out once: its corners, the axes of its sides and its bounding box. */
interface Prepared {
  id: string;
  corners: Point[];
  axes: [Point, Point];
  minX: number;
  maxX: number;
  minY: number;
  maxY: number;
}

function prepare(outline: PlacementOutline): Prepared {
  const radians = (outline.rotationDeg * Math.PI) / 180;
  const cos = Math.cos(radians);
  const sin = Math.sin(radians);
  const halfW = outline.widthMm / 2;
  const halfH = outline.heightMm / 2;
  const corners = [
    [-halfW, -halfH],
    [halfW, -halfH],
    [halfW, halfH],
    [-halfW, halfH],
  ].map(([dx, dy]) => ({
    x: outline.centerXMm + dx! * cos - dy! * sin,
    y: outline.centerYMm + dx! * sin + dy! * cos,
  }));
  const xs = corners.map((corner) => corner.x);
  const ys = corners.map((corner) => corner.y);
  return {
    id: outline.placementId,
    corners,
    axes: [
      { x: cos, y: sin },
      { x: -sin, y: cos },
    ],
    minX: Math.min(...xs),
    maxX: Math.max(...xs),
    minY: Math.min(...ys),
    maxY: Math.max(...ys),
  };
}

/** The shadow of a rectangle's corners on an axis: from `min` to `max` along it. */
function shadowOf(corners: readonly Point[], axis: Point): { min: number; max: number } {
  let min = Infinity;
  let max = -Infinity;
  for (const corner of corners) {
    const along = corner.x * axis.x + corner.y * axis.y;
    if (along < min) min = along;
    if (along > max) max = along;
  }
  return { min, max };
}

/** How far two shadows on one axis share: negative or 0 when the axis separates them. */
function sharedAlong(a: readonly Point[], b: readonly Point[], axis: Point): number {
  const shadowA = shadowOf(a, axis);
  const shadowB = shadowOf(b, axis);
  return Math.min(shadowA.max, shadowB.max) - Math.max(shadowA.min, shadowB.min);
}

function depthOf(a: Prepared, b: Prepared): number {
  // Boxes apart means the rectangles are apart (or touch): no overlap, and no need to try the four axes.
  if (a.maxX <= b.minX || b.maxX <= a.minX || a.maxY <= b.minY || b.maxY <= a.minY) return 0;
  let depth = Infinity;
  for (const axis of [a.axes[0], a.axes[1], b.axes[0], b.axes[1]]) {
    const shared = sharedAlong(a.corners, b.corners, axis);
    if (shared <= 0) return 0;
    depth = Math.min(depth, shared);
  }
  return Math.round(depth * 100) / 100;
}

/**
 * How deep two turned rectangles overlap, mm: the least overlap of their shadows on the four axes of their sides,
 * 0 when some axis separates them (the separating-axis theorem for convex shapes).
 */
export function overlapDepthMm(a: PlacementOutline, b: PlacementOutline): number {
  return depthOf(prepare(a), prepare(b));
}

/**
 * Every pair of placements whose outlines overlap by more than `MIN_OVERLAP_MM`, once per pair, in the order the
 * placements first appear, with the deepest overlap of their outlines.
 */
export function findOverlaps(outlines: readonly PlacementOutline[]): PlacementOverlap[] {
  const found = new Map<string, PlacementOverlap>();
  const prepared = outlines.map(prepare);
  for (let i = 0; i < prepared.length; i += 1) {
    const a = prepared[i]!;
    for (let j = i + 1; j < prepared.length; j += 1) {
      const b = prepared[j]!;
      if (a.id === b.id) continue;
      const depthMm = depthOf(a, b);
      if (depthMm <= MIN_OVERLAP_MM) continue;
      const key = a.id < b.id ? `${a.id}\u0000${b.id}` : `${b.id}\u0000${a.id}`;
      const known = found.get(key);
      if (!known || known.depthMm < depthMm) {
        found.set(key, { firstId: known?.firstId ?? a.id, secondId: known?.secondId ?? b.id, depthMm });
      }
    }
  }
  return [...found.values()];
}

/** The ids of the placements that overlap another one. */
export const overlappingIds = (overlaps: readonly PlacementOverlap[]): Set<string> =>
  new Set(overlaps.flatMap((overlap) => [overlap.firstId, overlap.secondId]));
