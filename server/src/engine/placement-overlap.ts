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

function cornersOf(outline: PlacementOutline): Point[] {
  const radians = (outline.rotationDeg * Math.PI) / 180;
  const cos = Math.cos(radians);
  const sin = Math.sin(radians);
  const halfW = outline.widthMm / 2;
  const halfH = outline.heightMm / 2;
  return [
    [-halfW, -halfH],
    [halfW, -halfH],
    [halfW, halfH],
    [-halfW, halfH],
  ].map(([dx, dy]) => ({
    x: outline.centerXMm + dx! * cos - dy! * sin,
    y: outline.centerYMm + dx! * sin + dy! * cos,
  }));
}

function axesOf(outline: PlacementOutline): Point[] {
  const radians = (outline.rotationDeg * Math.PI) / 180;
  return [
    { x: Math.cos(radians), y: Math.sin(radians) },
    { x: -Math.sin(radians), y: Math.cos(radians) },
  ];
}

function project(corners: readonly Point[], axis: Point): { min: number; max: number } {
  let min = Infinity;
  let max = -Infinity;
  for (const corner of corners) {
    const along = corner.x * axis.x + corner.y * axis.y;
    min = Math.min(min, along);
    max = Math.max(max, along);
  }
  return { min, max };
}

/**
 * How deep two turned rectangles overlap, mm: the least overlap of their shadows on the four axes of their sides,
 * 0 when some axis separates them (the separating-axis theorem for convex shapes).
 */
export function overlapDepthMm(a: PlacementOutline, b: PlacementOutline): number {
  const cornersA = cornersOf(a);
  const cornersB = cornersOf(b);
  let depth = Infinity;
  for (const axis of [...axesOf(a), ...axesOf(b)]) {
    const pa = project(cornersA, axis);
    const pb = project(cornersB, axis);
    const shared = Math.min(pa.max, pb.max) - Math.max(pa.min, pb.min);
    if (shared <= 0) return 0;
    depth = Math.min(depth, shared);
  }
  return Math.round(depth * 100) / 100;
}

/**
 * Every pair of placements whose outlines overlap by more than `MIN_OVERLAP_MM`, once per pair, in the order the
 * placements first appear, with the deepest overlap of their outlines.
 */
export function findOverlaps(outlines: readonly PlacementOutline[]): PlacementOverlap[] {
  const found = new Map<string, PlacementOverlap>();
  outlines.forEach((a, i) => {
    for (const b of outlines.slice(i + 1)) {
      if (a.placementId === b.placementId) continue;
      const depthMm = overlapDepthMm(a, b);
      if (depthMm <= MIN_OVERLAP_MM) continue;
      const key = JSON.stringify([a.placementId, b.placementId].sort());
      const known = found.get(key);
      if (!known || known.depthMm < depthMm) {
        found.set(key, {
          firstId: known?.firstId ?? a.placementId,
          secondId: known?.secondId ?? b.placementId,
          depthMm,
        });
      }
    }
  });
  return [...found.values()];
}

/** The ids of the placements that overlap another one. */
export const overlappingIds = (overlaps: readonly PlacementOverlap[]): Set<string> =>
  new Set(overlaps.flatMap((overlap) => [overlap.firstId, overlap.secondId]));
