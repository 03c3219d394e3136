import { fail, type EngineResult, type Failure } from './engine-result.ts';
import { isPositiveNumber, isRecord } from './input-checks.ts';
import { extentOf, filledArea, polylineLength, unionExtent, type Extent } from './outline-geometry.ts';
import { filledShapeKind, stitchFilledShape, stitchStroke, strokeKind, tallyTotal } from './shape-stitches.ts';
import { summariseParts, type StitchEstimate, type StitchedPart } from './stitch-estimate.ts';
import type { StitchSettings } from './stitch-settings.ts';
import { readSvgDrawing, type SvgDrawing } from './svg-document.ts';
import { measureSvgOutline } from './svg-path-outline.ts';
import { MM_PER_CSS_PX, parseSvgLengthMm } from './units.ts';

/**
 * How big the artwork is stitched. `mmPerUnit`: millimetres per SVG user unit. `widthMm`: the drawing's canvas
 * (its viewBox, as browsers size it) is stretched to this width. Without either, the file's own width/height
 * in absolute units (mm, cm, in, pt, px) sets the size.
 */
export type SvgSize = { mmPerUnit: number } | { widthMm: number };

/**
 * Stitches for SVG artwork: fills and narrow shapes from each filled outline, running stitch or satin from each
 * stroke (see `stitchFilledShape`, `stitchStroke`); elements are sewn in document order, one colour block per
 * run of one colour. Each element's stitch type is decided from the artwork as drawn (its own size, see
 * `drawnMmPerUnit`) and kept at every size it is stitched, so the count follows the size smoothly: a 0.5 mm line
 * stays a running stitch when the drawing is doubled, rather than jumping to a satin column as it crosses 1 mm
 * (issue 11). The counts themselves are worked out at the stitched size.
 */
export function estimateSvgStitches(
  svgText: string,
  size: SvgSize | undefined,
  settings: StitchSettings,
): EngineResult<StitchEstimate> {
  const drawing = readSvgDrawing(svgText);
  if ('reason' in drawing) return drawing;
  const mmPerUnit = resolveMmPerUnit(drawing, size);
  if (typeof mmPerUnit !== 'number') return mmPerUnit;
  // Millimetres as drawn per millimetre stitched: turns a stitched width back into the drawn one.
  const drawnPerStitched = drawnMmPerUnit(drawing) / mmPerUnit;

  const parts: StitchedPart[] = [];
  const notes = [...drawing.notes];
  let extent: Extent | undefined;
  let unmeasurable = 0;
  let truncated = 0;
  for (const drawable of drawing.drawables) {
    const outline = measureSvgOutline(drawable.pathData, drawable.transform, mmPerUnit, settings.flatteningToleranceMm);
    if (!outline) {
      unmeasurable += 1;
      continue;
    }
    if (outline.hasSyntaxError) truncated += 1;
    if (drawable.fill) {
      const area = filledArea(outline.polylines, drawable.fillRule);
      const perimeter = outline.polylines.reduce((sum, polyline) => sum + polylineLength(polyline, true), 0);
      const kind = filledShapeKind(area * drawnPerStitched ** 2, perimeter * drawnPerStitched, settings);
      const tally = stitchFilledShape(area, perimeter, settings, kind);
      if (tallyTotal(tally) > 0) parts.push({ color: drawable.fill, tally });
      extent = unionExtent(extent, extentOf(outline.polylines));
    }
    const strokeWidthMm = drawable.strokeWidth * outline.strokeScale * mmPerUnit;
    if (drawable.stroke && strokeWidthMm > 0) {
      const length = outline.polylines.reduce((sum, polyline) => sum + polylineLength(polyline), 0);
      const kind = strokeKind(strokeWidthMm * drawnPerStitched, settings);
      const tally = stitchStroke(length, strokeWidthMm, drawable.runPasses, settings, kind);
      if (tallyTotal(tally) > 0) parts.push({ color: drawable.stroke, tally });
      extent = unionExtent(extent, padded(extentOf(outline.polylines), strokeWidthMm / 2));
    }
  }
  if (truncated > 0) notes.push(`${truncated} × a path with an error in its data was measured only up to the error.`);
  if (unmeasurable > 0) notes.push(`${unmeasurable} × a shape with unreadable or out-of-range path data was skipped.`);
  return { ok: true, ...summariseParts(parts, extent, notes) };
}

/**
 * The artwork's own scale, mm per user unit: from its width and height in absolute units, as a browser sizes it;
 * a drawing that gives no size is taken at one CSS pixel per unit, the unit SVG user units default to.
 */
function drawnMmPerUnit(drawing: SvgDrawing): number {
  const own = resolveMmPerUnit(drawing, undefined);
  return typeof own === 'number' ? own : MM_PER_CSS_PX;
}

export function resolveMmPerUnit(drawing: SvgDrawing, size: SvgSize | undefined): number | Failure {
  if (size !== undefined) {
    if (isRecord(size) && 'mmPerUnit' in size) {
      return isPositiveNumber(size.mmPerUnit)
        ? size.mmPerUnit
        : fail('Millimetres per unit must be a positive number.');
    }
    if (!isRecord(size) || !isPositiveNumber(size.widthMm))
      return fail('The artwork size must give a positive width in millimetres or millimetres per unit.');
    const widthMm = parseSvgLengthMm(drawing.width);
    const canvasUnits = drawing.viewBox?.[2] ?? (widthMm === undefined ? undefined : widthMm / MM_PER_CSS_PX);
    return canvasUnits === undefined
      ? fail('The artwork has no viewBox or width, so it cannot be stretched to a width.')
      : size.widthMm / canvasUnits;
  }
  const widthMm = parseSvgLengthMm(drawing.width);
  const heightMm = parseSvgLengthMm(drawing.height);
  if (!drawing.viewBox) return MM_PER_CSS_PX;
  // With a viewBox the drawing keeps its proportions inside width × height (preserveAspectRatio "meet").
  const scales = [
    widthMm === undefined ? undefined : widthMm / drawing.viewBox[2],
    heightMm === undefined ? undefined : heightMm / drawing.viewBox[3],
  ];
  const known = scales.filter((scale): scale is number => scale !== undefined);
  if (known.length === 0) return fail('The artwork does not say how big it is: give its width in millimetres.');
  return Math.min(...known);
}

function padded(extent: Extent | undefined, byMm: number): Extent | undefined {
  return (
    extent && { minX: extent.minX - byMm, minY: extent.minY - byMm, maxX: extent.maxX + byMm, maxY: extent.maxY + byMm }
  );
}
