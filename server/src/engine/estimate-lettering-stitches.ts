import { LRUCache } from 'lru-cache';
import { fail, type EngineResult } from './engine-result.ts';
import { isPositiveNumber, isRecord } from './input-checks.ts';
import { formatNumber } from './wording.ts';
import {
  extentOf,
  filledArea,
  flattenOutline,
  polylineLength,
  unionExtent,
  type Extent,
  type OutlineCommand,
} from './outline-geometry.ts';
import { stitchFilledShape, tallyTotal } from './shape-stitches.ts';
import { summariseParts, type StitchEstimate, type StitchedPart } from './stitch-estimate.ts';
import type { StitchSettings } from './stitch-settings.ts';

/**
 * A parsed font that can draw glyph outlines; an opentype.js `Font` fits as it is. Coordinates come back in the
 * units of `fontSize` with y pointing down, one path per glyph. Loading the font file is the caller's job, so the
 * engine stays free of file access and runs in the browser too.
 */
export interface GlyphOutlineSource {
  getPaths(
    text: string,
    x: number,
    y: number,
    fontSize: number,
  ): ReadonlyArray<{ commands: readonly OutlineCommand[] }>;
}

/** Letter height is measured on this glyph: the trade sizes lettering by its capitals (common practice, no source). */
const HEIGHT_REFERENCE_GLYPH = 'H';

/** Longer text than this is not lettering for a garment; the cap keeps one request from drawing a book. */
export const MAX_LETTERING_CHARACTERS = 200;

/** Thread colour key for lettering, which is sewn in one colour. */
const LETTERING_COLOR = 'lettering';

/**
 * Laid-out lettering kept per font and stitch settings, by letter height and text: the designer prices the same
 * name again on every other change, and drawing and measuring the glyphs is most of a quote's time. The answer
 * for the same font, settings, height and text never changes, so keeping it changes no result.
 */
const LAYOUTS_KEPT_PER_FONT = 500;
const layouts = new WeakMap<
  GlyphOutlineSource,
  WeakMap<StitchSettings, LRUCache<string, EngineResult<StitchEstimate>>>
>();
/** Each font's capital-H height at font size 1, measured once. */
const capHeights = new WeakMap<GlyphOutlineSource, number>();

function keptLayoutsOf(font: GlyphOutlineSource, settings: StitchSettings) {
  let bySettings = layouts.get(font);
  if (!bySettings) layouts.set(font, (bySettings = new WeakMap()));
  let kept = bySettings.get(settings);
  if (!kept) bySettings.set(settings, (kept = new LRUCache({ max: LAYOUTS_KEPT_PER_FONT })));
  return kept;
}

function capHeightOf(font: GlyphOutlineSource): number {
  let capHeight = capHeights.get(font);
  if (capHeight === undefined) {
    const reference = extentOf(flattenOutline(font.getPaths(HEIGHT_REFERENCE_GLYPH, 0, 0, 1)[0]?.commands ?? [], 1e-4));
    capHeight = reference ? reference.maxY - reference.minY : 0;
    capHeights.set(font, capHeight);
  }
  return capHeight;
}

/**
 * Stitches for text in a font at a letter height (the height of a capital H), mm. Each glyph outline is
 * measured like filled artwork: a satin column when its strokes are narrower than the satin limit, otherwise a
 * fill. Reports the stitched width and height of the whole text. The result is shared by later calls with the
 * same arguments, so it is frozen.
 */
export function estimateLetteringStitches(
  text: string,
  font: GlyphOutlineSource,
  letterHeightMm: number,
  settings: StitchSettings,
): EngineResult<StitchEstimate> {
  if (typeof text !== 'string' || text.trim() === '') return fail('There is no text to stitch.');
  if ([...text].length > MAX_LETTERING_CHARACTERS)
    return fail(`Lettering is limited to ${MAX_LETTERING_CHARACTERS} characters.`);
  if (!isPositiveNumber(letterHeightMm)) return fail('The letter height must be a positive number of millimetres.');
  if (!isRecord(font) || typeof font.getPaths !== 'function') return fail('No font was given for the lettering.');
  const kept = keptLayoutsOf(font, settings);
  const key = `${letterHeightMm}|${text}`;
  let estimate = kept.get(key);
  if (!estimate) {
    estimate = deepFreeze(layOutLettering(text, font, letterHeightMm, settings));
    kept.set(key, estimate);
  }
  return estimate;
}

function deepFreeze<T>(value: T): T {
  if (typeof value === 'object' && value !== null && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const inner of Object.values(value)) deepFreeze(inner);
  }
  return value;
}

function layOutLettering(
  text: string,
  font: GlyphOutlineSource,
  letterHeightMm: number,
  settings: StitchSettings,
): EngineResult<StitchEstimate> {
  try {
    const capHeight = capHeightOf(font);
    if (!(capHeight > 0))
      return fail(`This font has no capital ${HEIGHT_REFERENCE_GLYPH} to measure the letter height by.`);
    const fontSize = letterHeightMm / capHeight;

    const parts: StitchedPart[] = [];
    let extent: Extent | undefined;
    for (const glyph of font.getPaths(text, 0, 0, fontSize)) {
      const polylines = flattenOutline(glyph.commands, settings.flatteningToleranceMm);
      const perimeter = polylines.reduce((sum, polyline) => sum + polylineLength(polyline, true), 0);
      const tally = stitchFilledShape(filledArea(polylines, 'nonzero'), perimeter, settings);
      if (tallyTotal(tally) === 0) continue;
      parts.push({ color: LETTERING_COLOR, tally });
      extent = unionExtent(extent, extentOf(polylines));
    }
    if (parts.length === 0) return fail('None of these characters has an outline in this font.');
    const estimate = summariseParts(parts, extent, []);
    if (!Number.isFinite(estimate.stitches)) return fail('The font returned outlines that cannot be measured.');
    return { ok: true, ...estimate };
  } catch (error) {
    // The font is the caller's object; a failure inside it must not take the quote down.
    return fail(
      `The font could not draw this text at ${formatNumber(letterHeightMm)} mm (${error instanceof Error ? error.message : 'unknown error'}).`,
    );
  }
}
