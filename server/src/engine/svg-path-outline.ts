import svgpath from 'svgpath';
import { createOutlineFlattener, type Polyline } from './outline-geometry.ts';

export interface MeasuredOutline {
  polylines: Polyline[];
  /** How much the element's transforms scale a stroke's width (square root of the determinant). */
  strokeScale: number;
  hasSyntaxError: boolean;
}

/**
 * SVG path data under a transform list, flattened to millimetres (svgpath parses it, applies the transforms, and
 * turns arcs and shorthand curves into plain Béziers). `undefined` when nothing measurable is left.
 */
export function measureSvgOutline(
  pathData: string,
  transform: string,
  mmPerUnit: number,
  toleranceMm: number,
): MeasuredOutline | undefined {
  const parsed = svgpath(pathData);
  // svgpath keeps what it read before a syntax error (its `err`, missing from its typings), as SVG renderers
  // draw a path up to its first error.
  const hasSyntaxError = Boolean((parsed as unknown as { err?: string }).err);
  const flattener = createOutlineFlattener(toleranceMm);
  parsed
    .transform(transform)
    .scale(mmPerUnit)
    .abs()
    .unarc()
    .unshort()
    .iterate((segment, _index, x, y) => {
      const [type] = segment;
      const values = segment as unknown as number[];
      if (type === 'M') flattener.moveTo(values[1], values[2]);
      else if (type === 'L') flattener.lineTo(values[1], values[2]);
      else if (type === 'H') flattener.lineTo(values[1], y);
      else if (type === 'V') flattener.lineTo(x, values[1]);
      else if (type === 'C') flattener.cubicTo(values[1], values[2], values[3], values[4], values[5], values[6]);
      else if (type === 'Q') flattener.quadTo(values[1], values[2], values[3], values[4]);
      else if (type === 'Z' || type === 'z') flattener.close();
    });
  const polylines = flattener.finish();
  if (polylines.length === 0 || !polylines.every((polyline) => polyline.points.every(Number.isFinite)))
    return undefined;
  return { polylines, strokeScale: transformScale(transform), hasSyntaxError };
}

function transformScale(transform: string): number {
  const corners: number[] = [];
  svgpath('M0 0L1 0L0 1')
    .transform(transform)
    .abs()
    .iterate((segment) => {
      corners.push(segment[1] as number, segment[2] as number);
    });
  const determinant =
    (corners[2] - corners[0]) * (corners[5] - corners[1]) - (corners[3] - corners[1]) * (corners[4] - corners[0]);
  return Math.sqrt(Math.abs(determinant)) || 0;
}
