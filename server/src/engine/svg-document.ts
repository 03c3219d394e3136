import { XMLParser } from 'fast-xml-parser';
import svgpath from 'svgpath';
import { cssColorToHex } from './color-difference.ts';
import { fail, type Failure } from './engine-result.ts';
import type { FillRule } from './outline-geometry.ts';
import { RUN_PASSES } from './stitch-settings.ts';
import { shapeToPathData } from './svg-shapes.ts';

/** One shape to stitch, as drawn: path data in the element's own user units and the transforms above it. */
export interface SvgDrawable {
  pathData: string;
  /** Every transform from the root down to the element, outermost first (an SVG transform list). */
  transform: string;
  /** Colour of the fill (`#rrggbb` where it can be read), or null when not filled. */
  fill: string | null;
  stroke: string | null;
  /** Stroke width in the element's user units. */
  strokeWidth: number;
  fillRule: FillRule;
  /** Passes over a running-stitch line: 1, or more when `data-stitch` says double, triple or bean. */
  runPasses: number;
}

/** The root's `width`/`height` (raw) and `viewBox`, for working out the size. */
export interface SvgCanvas {
  width?: string;
  height?: string;
  viewBox?: [number, number, number, number];
}

export interface SvgDrawing extends SvgCanvas {
  drawables: SvgDrawable[];
  notes: string[];
}

/**
 * Path segments in one drawing, all shapes together: a traced child's drawing has a few thousand, and each
 * segment costs measuring time on every estimate (common practice, no source).
 */
export const MAX_SVG_PATH_SEGMENTS = 20_000;
/** Elements in one drawing, whatever they are. */
export const MAX_SVG_ELEMENTS = 5_000;

interface Style {
  fill: string | null;
  stroke: string | null;
  strokeWidth: number;
  fillRule: FillRule;
  runPasses: number;
  color: string;
  isHidden: boolean;
}

type XmlNode = Record<string, unknown>;

const CONTAINERS = new Set(['svg', 'g', 'a', 'switch']);
const SHAPES = new Set(['path', 'rect', 'circle', 'ellipse', 'line', 'polyline', 'polygon']);
/** Elements that draw but cannot be estimated from their outline; each gets a note instead of a guess. */
const SKIPPED_WITH_NOTE: Readonly<Record<string, string>> = {
  text: 'text was skipped: convert text to outlines (paths) to include it',
  use: 'a reused symbol (<use>) was skipped: ungroup or expand it to include it',
  image: 'a picture (<image>) was skipped: photos and bitmaps need digitizing by hand',
  foreignObject: 'embedded HTML (<foreignObject>) was skipped',
  style: 'a <style> sheet was ignored: colours set by CSS classes are not read, only attributes and style="…"',
};

/** SVG's initial values: black fill, no stroke, 1 unit stroke width (SVG 2 §13, "Painting"). */
const INITIAL_STYLE: Style = {
  fill: '#000000',
  stroke: null,
  strokeWidth: 1,
  fillRule: 'nonzero',
  runPasses: 1,
  color: '#000000',
  isHidden: false,
};

/**
 * Reads SVG text into the shapes to stitch, without a DOM (fast-xml-parser), honouring nested `<g transform>`,
 * presentation attributes, `style="…"` declarations and the `data-stitch` attribute (`double`, `triple` or
 * `bean` on a shape or group marks a multi-pass running stitch; groups pass it down).
 */
export function readSvgDrawing(svgText: string): SvgDrawing | Failure {
  if (typeof svgText !== 'string' || svgText.trim() === '') return fail('The artwork file is empty.');
  let nodes: unknown;
  try {
    // processEntities off: SVG artwork needs no entities, and expanding them is how XML bombs work.
    nodes = new XMLParser({
      preserveOrder: true,
      ignoreAttributes: false,
      attributeNamePrefix: '',
      processEntities: false,
      parseAttributeValue: false,
    }).parse(svgText);
  } catch (error) {
    return fail(`The artwork is not readable SVG (${error instanceof Error ? error.message : 'unknown XML error'}).`);
  }
  const root = Array.isArray(nodes) ? nodes.find((node: XmlNode) => tagOf(node) === 'svg') : undefined;
  if (!root) return fail('The file has no <svg> element, so it is not SVG artwork.');

  const elements = countElements(nodes);
  if (elements > MAX_SVG_ELEMENTS)
    return fail(
      `The artwork has ${formatCount(elements)} elements; ${formatCount(MAX_SVG_ELEMENTS)} at most can be measured, so simplify or merge its shapes.`,
    );
  const drawing: SvgDrawing = { drawables: [], notes: [] };
  const rootAttributes = attributesOf(root);
  drawing.width = rootAttributes.width;
  drawing.height = rootAttributes.height;
  drawing.viewBox = parseViewBox(rootAttributes.viewBox);
  const skipped = new Map<string, number>();
  walk(root, INITIAL_STYLE, '', drawing.drawables, skipped);
  for (const [tag, count] of skipped) drawing.notes.push(`${count} × ${SKIPPED_WITH_NOTE[tag]}.`);
  const segments = drawing.drawables.reduce((sum, drawable) => sum + segmentCount(drawable.pathData), 0);
  if (segments > MAX_SVG_PATH_SEGMENTS)
    return fail(
      `The artwork's paths have ${formatCount(segments)} segments; ${formatCount(MAX_SVG_PATH_SEGMENTS)} at most can be measured, so simplify the paths (fewer nodes) and upload it again.`,
    );
  return drawing;
}

const formatCount = (value: number) => value.toLocaleString('en-GB');

/** The path's segments as svgpath reads them (its `segments`, missing from its typings). */
function segmentCount(pathData: string): number {
  return (svgpath(pathData) as unknown as { segments: unknown[] }).segments.length;
}

/** Every element in the parsed tree, at any depth. */
function countElements(nodes: unknown): number {
  let total = 0;
  const stack: unknown[] = Array.isArray(nodes) ? [...nodes] : [];
  while (stack.length > 0) {
    const node = stack.pop();
    if (!isElement(node)) continue;
    total += 1;
    const key = Object.keys(node as XmlNode).find((name) => name !== ':@');
    const children = key === undefined ? undefined : (node as XmlNode)[key];
    if (Array.isArray(children)) stack.push(...children);
  }
  return total;
}

/** An element node of any name (text, comments and processing instructions are not). */
function isElement(node: unknown): boolean {
  if (typeof node !== 'object' || node === null) return false;
  return Object.keys(node).some((name) => name !== ':@' && !name.startsWith('#') && !name.startsWith('?'));
}

function walk(
  node: XmlNode,
  inherited: Style,
  transform: string,
  out: SvgDrawable[],
  skipped: Map<string, number>,
): void {
  const tag = tagOf(node);
  if (tag === undefined) return;
  if (Object.hasOwn(SKIPPED_WITH_NOTE, tag)) {
    if (tag !== 'style' || hasText(node)) skipped.set(tag, (skipped.get(tag) ?? 0) + 1);
    return;
  }
  if (!CONTAINERS.has(tag) && !SHAPES.has(tag)) return;
  const attributes = attributesOf(node);
  const style = resolveStyle(inherited, attributes);
  if (style.isHidden) return;
  const ownTransform = attributes.transform?.trim();
  const fullTransform = ownTransform ? `${transform} ${ownTransform}` : transform;
  if (CONTAINERS.has(tag)) {
    for (const child of childrenOf(node)) walk(child as XmlNode, style, fullTransform, out, skipped);
    return;
  }
  const pathData = shapeToPathData(tag, attributes);
  // A line has no inside, so it can only be stroked.
  const fill = tag === 'line' ? null : style.fill;
  if (pathData && (fill || style.stroke)) {
    out.push({
      pathData,
      transform: fullTransform,
      fill,
      stroke: style.stroke,
      strokeWidth: style.strokeWidth,
      fillRule: style.fillRule,
      runPasses: style.runPasses,
    });
  }
}

/** Presentation attributes first, then `style="…"`, which wins as CSS would have it. */
function resolveStyle(inherited: Style, attributes: Readonly<Record<string, string>>): Style {
  const declared: Record<string, string> = {};
  for (const name of ['fill', 'stroke', 'stroke-width', 'fill-rule', 'color', 'display', 'visibility']) {
    if (attributes[name] !== undefined) declared[name] = attributes[name];
  }
  for (const declaration of (attributes.style ?? '').split(';')) {
    const colon = declaration.indexOf(':');
    if (colon > 0)
      declared[declaration.slice(0, colon).trim().toLowerCase()] = declaration
        .slice(colon + 1)
        .replace(/!important/i, '')
        .trim();
  }
  const style = { ...inherited };
  if (declared.color !== undefined && declared.color !== 'inherit') style.color = declared.color;
  if (declared.fill !== undefined) style.fill = paint(declared.fill, inherited.fill, style.color);
  if (declared.stroke !== undefined) style.stroke = paint(declared.stroke, inherited.stroke, style.color);
  const strokeWidth = Number.parseFloat(declared['stroke-width'] ?? '');
  if (Number.isFinite(strokeWidth) && strokeWidth >= 0) style.strokeWidth = strokeWidth;
  if (declared['fill-rule'] === 'evenodd' || declared['fill-rule'] === 'nonzero')
    style.fillRule = declared['fill-rule'];
  const stitch = attributes['data-stitch']?.trim().toLowerCase() ?? '';
  if (Object.hasOwn(RUN_PASSES, stitch)) style.runPasses = RUN_PASSES[stitch];
  style.isHidden =
    declared.display === 'none' || declared.visibility === 'hidden' || declared.visibility === 'collapse';
  return style;
}

/** A paint value as a colour key: null for none/transparent, `#rrggbb` for colours, the raw text otherwise (url(#…)). */
function paint(value: string, inherited: string | null, currentColor: string): string | null {
  const text = value.trim();
  const lower = text.toLowerCase();
  if (lower === 'inherit') return inherited;
  if (lower === 'none' || lower === '') return null;
  const hex = cssColorToHex(lower === 'currentcolor' ? currentColor : text);
  return hex === undefined ? text : hex;
}

function parseViewBox(value: string | undefined): [number, number, number, number] | undefined {
  const numbers = (value ?? '')
    .trim()
    .split(/[\s,]+/)
    .map(Number);
  if (numbers.length !== 4 || !numbers.every(Number.isFinite) || numbers[2] <= 0 || numbers[3] <= 0) return undefined;
  return [numbers[0], numbers[1], numbers[2], numbers[3]];
}

/** The element name without an `svg:` prefix; other prefixes (editor metadata such as inkscape:) are not SVG. */
function tagOf(node: unknown): string | undefined {
  if (typeof node !== 'object' || node === null) return undefined;
  const key = Object.keys(node).find((name) => name !== ':@' && !name.startsWith('#') && !name.startsWith('?'));
  if (key === undefined) return undefined;
  if (key.startsWith('svg:')) return key.slice(4);
  return key.includes(':') ? undefined : key;
}

function childrenOf(node: XmlNode): unknown[] {
  const key = Object.keys(node).find((name) => name !== ':@');
  const children = key === undefined ? undefined : node[key];
  return Array.isArray(children) ? children.filter((child) => tagOf(child) !== undefined) : [];
}

function hasText(node: XmlNode): boolean {
  const children = node[Object.keys(node).find((name) => name !== ':@') ?? ''];
  return (
    Array.isArray(children) &&
    children.some((child) => typeof child?.['#text'] === 'string' && child['#text'].trim() !== '')
  );
}

function attributesOf(node: XmlNode): Readonly<Record<string, string>> {
  const attributes = node[':@'];
  if (typeof attributes !== 'object' || attributes === null) return {};
  const out: Record<string, string> = {};
  for (const [name, value] of Object.entries(attributes)) if (typeof value === 'string') out[name] = value;
  return out;
}
