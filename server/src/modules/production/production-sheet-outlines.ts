/**
 * Stitched outlines as SVG path data in millimetres, for the 1:1 templates: a catalogue motif's artwork (its
 * stored SVG, scaled from its viewBox to the stitched size) and lettering set in the shipped font.
 */
import svgpath from 'svgpath';
import type { GlyphOutlineSource, OutlineCommand } from '../../engine/index.ts';
import { extentOf, flattenOutline, type Extent } from '../../engine/outline-geometry.ts';
import { readSvgDrawing } from '../../engine/svg-document.ts';
import { parseSvgLengthMm } from '../../engine/units.ts';

/** One stroked piece of a template, in mm with its top-left at the origin of the artwork's box. */
export interface Outline {
  d: string;
  /** The artwork's own colour for that piece (`#rrggbb`). */
  hex: string;
  /** False for a stroked line (a running stitch), which has no inside. */
  isFilled: boolean;
}

export interface ArtworkOutline {
  widthMm: number;
  heightMm: number;
  outlines: Outline[];
  /** A raster upload has no outline: the template prints the picture itself (PNG data URL). */
  pictureDataUrl?: string;
}

/** Path data to a hundredth of a millimetre: far finer than a printer or a needle can place. */
const DECIMALS = 2;
const INK = '#2e241e';
/** The capital whose height sets a lettering size, as the engine's lettering estimate measures it. */
const HEIGHT_REFERENCE_GLYPH = 'H';
const FLATTEN_TOLERANCE = 1e-4;

/**
 * A motif's artwork at `scale` (1 = the catalogue size `widthMm` × `heightMm`): every shape of its SVG with the
 * transforms above it applied, the viewBox origin moved to 0,0 and user units turned into mm.
 */
export function motifOutline(
  svgText: string,
  motif: { widthMm: number; heightMm: number },
  scale: number,
): ArtworkOutline | undefined {
  const drawing = readSvgDrawing(svgText);
  if ('reason' in drawing) return undefined;
  const [minX, minY, viewWidth] = drawing.viewBox ?? [0, 0, parseSvgLengthMm(drawing.width) ?? motif.widthMm];
  const mmPerUnit = (motif.widthMm / viewWidth) * scale;
  const outlines = drawing.drawables.map((drawable) => ({
    d: svgpath(drawable.pathData)
      .transform(drawable.transform)
      .translate(-minX, -minY)
      .scale(mmPerUnit)
      .abs()
      .round(DECIMALS)
      .toString(),
    hex: drawable.fill ?? drawable.stroke ?? INK,
    isFilled: drawable.fill !== null,
  }));
  return { widthMm: motif.widthMm * scale, heightMm: motif.heightMm * scale, outlines };
}

/** Lettering outlines with the capital H `letterHeightMm` tall, as the engine sizes lettering for its estimate. */
export function letteringOutline(
  font: GlyphOutlineSource,
  text: string,
  letterHeightMm: number,
  hex: string,
): ArtworkOutline | undefined {
  const reference = extentOf(
    flattenOutline(font.getPaths(HEIGHT_REFERENCE_GLYPH, 0, 0, 1)[0]?.commands ?? [], FLATTEN_TOLERANCE),
  );
  const capHeight = reference ? reference.maxY - reference.minY : 0;
  if (!(capHeight > 0)) return undefined;
  const commands = font.getPaths(text, 0, 0, letterHeightMm / capHeight).flatMap((glyph) => glyph.commands);
  const extent = extentOf(flattenOutline(commands, FLATTEN_TOLERANCE));
  if (!extent) return undefined;
  return {
    widthMm: extent.maxX - extent.minX,
    heightMm: extent.maxY - extent.minY,
    outlines: [{ d: commandsToPathData(commands, extent), hex, isFilled: true }],
  };
}

/** Moves every piece of an artwork outline by (xMm, yMm), for placing it inside a template. */
export function placeOutlines(outlines: readonly Outline[], xMm: number, yMm: number): Outline[] {
  return outlines.map((outline) => ({
    ...outline,
    d: svgpath(outline.d).translate(xMm, yMm).round(DECIMALS).toString(),
  }));
}

function commandsToPathData(commands: readonly OutlineCommand[], origin: Extent): string {
  const x = (value: number) => Number((value - origin.minX).toFixed(DECIMALS));
  const y = (value: number) => Number((value - origin.minY).toFixed(DECIMALS));
  return commands
    .map((c) => {
      if (c.type === 'M' || c.type === 'L') return `${c.type}${x(c.x)} ${y(c.y)}`;
      if (c.type === 'Q') return `Q${x(c.x1)} ${y(c.y1)} ${x(c.x)} ${y(c.y)}`;
      if (c.type === 'C') return `C${x(c.x1)} ${y(c.y1)} ${x(c.x2)} ${y(c.y2)} ${x(c.x)} ${y(c.y)}`;
      return 'Z';
    })
    .join('');
}
