import { fail, type EngineResult, type Failure } from './engine-result.ts';
import { isRecord } from './input-checks.ts';
import { extentOf, filledArea, polylineLength, unionExtent, type Extent } from './outline-geometry.ts';
import { filledShapeKind, stitchFilledShape, stitchStroke, strokeKind, tallyTotal } from './shape-stitches.ts';
import { summariseParts, type StitchEstimate, type StitchedPart } from './stitch-estimate.ts';
import type { StitchSettings } from './stitch-settings.ts';
import { readSvgDrawing, type SvgCanvas } from './svg-document.ts';
import { measureSvgOutline } from './svg-path-outline.ts';
import { MM_PER_CSS_PX, parseSvgLengthMm } from './units.ts';

/**
 * How big the artwork is stitched. `mmPerUnit`: millimetres per SVG user unit. `widthMm`: the drawing's canvas
 * (its viewBox, as browsers size it) is stretched to this width. Without either, the file's own width/height
 * in absolute units (mm, cm, in, pt, px) sets the size.
 */
export type SvgSize = { mmPerUnit: number } | { widthMm: number };

/** One stitched object as measured in the drawing's user units (after its transforms), before any size is known. */
export type SvgShapeFigures =
  | { kind: 'fill'; color: string; areaUnits2: number; perimeterUnits: number; extent: Extent | undefined }
  | {
      kind: 'stroke';
      color: string;
      lengthUnits: number;
      /** The stroke's width under the element's transforms. */
      widthUnits: number;
      runPasses: number;
      extent: Extent | undefined;
    };

/**
 * What a stitch estimate needs of SVG artwork, measured once (parsing and flattening are the slow part) and
 * turned into stitches at any size by `estimateSvgFigures` with plain arithmetic. Plain JSON, so it is stored
 * with an upload.
 */
export interface SvgArtworkFigures extends SvgCanvas {
  version: 1;
  shapes: SvgShapeFigures[];
  notes: string[];
}

/**
 * Curves are flattened as finely as if the drawing were stitched this wide, wider than any hoop's field, so the
 * figures hold at every size a quote may ask for.
 */
const MEASURED_AS_IF_WIDE_MM = 400;

/** Figures for SVG artwork: each filled outline's area and perimeter, each stroke's length and width. */
export function measureSvgArtwork(
  svgText: string,
  settings: StitchSettings,
): EngineResult<{ figures: SvgArtworkFigures }> {
  const drawing = readSvgDrawing(svgText);
  if ('reason' in drawing) return drawing;
  const canvasUnits =
    drawing.viewBox?.[2] ?? (parseSvgLengthMm(drawing.width) ?? MEASURED_AS_IF_WIDE_MM) / MM_PER_CSS_PX;
  const toleranceUnits = (settings.flatteningToleranceMm * canvasUnits) / MEASURED_AS_IF_WIDE_MM;

  const shapes: SvgShapeFigures[] = [];
  const notes = [...drawing.notes];
  let unmeasurable = 0;
  let truncated = 0;
  for (const drawable of drawing.drawables) {
    const outline = measureSvgOutline(drawable.pathData, drawable.transform, 1, toleranceUnits);
    if (!outline) {
      unmeasurable += 1;
      continue;
    }
    if (outline.hasSyntaxError) truncated += 1;
    if (drawable.fill) {
      shapes.push({
        kind: 'fill',
        color: drawable.fill,
        areaUnits2: filledArea(outline.polylines, drawable.fillRule),
        perimeterUnits: outline.polylines.reduce((sum, polyline) => sum + polylineLength(polyline, true), 0),
        extent: extentOf(outline.polylines),
      });
    }
    const widthUnits = drawable.strokeWidth * outline.strokeScale;
    if (drawable.stroke && widthUnits > 0) {
      shapes.push({
        kind: 'stroke',
        color: drawable.stroke,
        lengthUnits: outline.polylines.reduce((sum, polyline) => sum + polylineLength(polyline), 0),
        widthUnits,
        runPasses: drawable.runPasses,
        extent: padded(extentOf(outline.polylines), widthUnits / 2),
      });
    }
  }
  if (!shapes.every(isFiniteShape))
    return fail(
      'The artwork has a shape too large to measure (its coordinates overflow); draw it at an ordinary size, within a viewBox of sensible numbers.',
    );
  if (truncated > 0) notes.push(`${truncated} × a path with an error in its data was measured only up to the error.`);
  if (unmeasurable > 0) notes.push(`${unmeasurable} × a shape with unreadable or out-of-range path data was skipped.`);
  const { width, height, viewBox } = drawing;
  return { ok: true, figures: { version: 1, width, height, viewBox, shapes, notes } };
}

/**
 * Stitches for measured SVG artwork at a size: fills and narrow shapes from each filled outline, running stitch
 * or satin from each stroke (see `stitchFilledShape`, `stitchStroke`); shapes are sewn in document order, one
 * colour block per run of one colour. Each shape's stitch type is decided from the artwork as drawn (its own
 * size, see `drawnMmPerUnit`) and kept at every size it is stitched, so the count follows the size smoothly: a
 * 0.5 mm line stays a running stitch when the drawing is doubled, rather than jumping to a satin column as it
 * crosses 1 mm. The counts themselves are worked out at the stitched size.
 */
export function estimateSvgFigures(
  figures: SvgArtworkFigures,
  size: SvgSize | undefined,
  settings: StitchSettings,
): EngineResult<StitchEstimate> {
  if (!isRecord(figures) || figures.version !== 1 || !Array.isArray(figures.shapes))
    return fail('The artwork has no stored measurements; upload it again.');
  const mmPerUnit = resolveMmPerUnit(figures, size);
  if (typeof mmPerUnit !== 'number') return mmPerUnit;
  const drawnMm = drawnMmPerUnit(figures, mmPerUnit);
  const parts: StitchedPart[] = [];
  let extent: Extent | undefined;
  for (const shape of figures.shapes) {
    let tally;
    if (shape.kind === 'fill') {
      const kind = filledShapeKind(shape.areaUnits2 * drawnMm * drawnMm, shape.perimeterUnits * drawnMm, settings);
      tally = stitchFilledShape(
        shape.areaUnits2 * mmPerUnit * mmPerUnit,
        shape.perimeterUnits * mmPerUnit,
        settings,
        kind,
      );
    } else {
      const kind = strokeKind(shape.widthUnits * drawnMm, settings);
      tally = stitchStroke(
        shape.lengthUnits * mmPerUnit,
        shape.widthUnits * mmPerUnit,
        shape.runPasses,
        settings,
        kind,
      );
    }
    if (tallyTotal(tally) > 0) parts.push({ color: shape.color, tally });
    extent = unionExtent(extent, scaled(shape.extent, mmPerUnit));
  }
  return { ok: true, ...summariseParts(parts, extent, [...figures.notes]) };
}

/**
 * The artwork's own scale, mm per user unit: from its width and height in absolute units, as a browser sizes it.
 * A drawing that gives no absolute size has no "as drawn" size to judge by, so its types are judged at the size
 * it is stitched (`stitchedMmPerUnit`).
 */
function drawnMmPerUnit(canvas: SvgCanvas, stitchedMmPerUnit: number): number {
  const own = resolveMmPerUnit(canvas, undefined);
  return typeof own === 'number' ? own : stitchedMmPerUnit;
}

/** Millimetres per user unit for a canvas at a size, or why it cannot be worked out. */
export function resolveMmPerUnit(canvas: SvgCanvas, size: SvgSize | undefined): number | Failure {
  if (size !== undefined) {
    if (isRecord(size) && 'mmPerUnit' in size) {
      return typeof size.mmPerUnit === 'number' && Number.isFinite(size.mmPerUnit) && size.mmPerUnit > 0
        ? size.mmPerUnit
        : fail('Millimetres per unit must be a positive number.');
    }
    if (!isRecord(size) || typeof size.widthMm !== 'number' || !(size.widthMm > 0) || !Number.isFinite(size.widthMm))
      return fail('The artwork size must give a positive width in millimetres or millimetres per unit.');
    const widthMm = parseSvgLengthMm(canvas.width);
    const canvasUnits = canvas.viewBox?.[2] ?? (widthMm === undefined ? undefined : widthMm / MM_PER_CSS_PX);
    return canvasUnits === undefined
      ? fail('The artwork has no viewBox or width, so it cannot be stretched to a width.')
      : size.widthMm / canvasUnits;
  }
  const widthMm = parseSvgLengthMm(canvas.width);
  const heightMm = parseSvgLengthMm(canvas.height);
  if (!canvas.viewBox) return MM_PER_CSS_PX;
  // With a viewBox the drawing keeps its proportions inside width × height (preserveAspectRatio "meet").
  const scales = [
    widthMm === undefined ? undefined : widthMm / canvas.viewBox[2],
    heightMm === undefined ? undefined : heightMm / canvas.viewBox[3],
  ];
  const known = scales.filter((scale): scale is number => scale !== undefined);
  if (known.length === 0) return fail('The artwork does not say how big it is: give its width in millimetres.');
  return Math.min(...known);
}

function isFiniteShape(shape: SvgShapeFigures): boolean {
  const numbers =
    shape.kind === 'fill' ? [shape.areaUnits2, shape.perimeterUnits] : [shape.lengthUnits, shape.widthUnits];
  const { extent } = shape;
  if (extent) numbers.push(extent.minX, extent.minY, extent.maxX, extent.maxY);
  return numbers.every(Number.isFinite);
}

function padded(extent: Extent | undefined, by: number): Extent | undefined {
  return extent && { minX: extent.minX - by, minY: extent.minY - by, maxX: extent.maxX + by, maxY: extent.maxY + by };
}

function scaled(extent: Extent | undefined, by: number): Extent | undefined {
  return extent && { minX: extent.minX * by, minY: extent.minY * by, maxX: extent.maxX * by, maxY: extent.maxY * by };
}
