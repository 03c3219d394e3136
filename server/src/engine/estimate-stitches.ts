import { fail, type EngineResult } from './engine-result.ts';
import { isRecord } from './input-checks.ts';
import { estimateCatalogueStitches, type CatalogueMotif } from './estimate-catalogue-stitches.ts';
import { estimateLetteringStitches, type GlyphOutlineSource } from './estimate-lettering-stitches.ts';
import { estimateSvgStitches } from './estimate-svg-stitches.ts';
import type { StitchEstimate } from './stitch-estimate.ts';
import { resolveStitchSettings, type StitchSettings } from './stitch-settings.ts';
import { estimateSvgFigures, type SvgArtworkFigures, type SvgSize } from './svg-artwork-figures.ts';

/** What to estimate: a catalogue motif at a scale, SVG artwork (as text or as measured once), or lettering. */
export type StitchSource =
  | { kind: 'catalogue'; motif: CatalogueMotif; scale: number }
  | { kind: 'svg'; svgText: string; size?: SvgSize }
  | { kind: 'svg-figures'; figures: SvgArtworkFigures; size?: SvgSize }
  | { kind: 'lettering'; text: string; font: GlyphOutlineSource; letterHeightMm: number };

/**
 * Estimates stitches, colour changes and trims for one design source, with its stitched width and height in mm.
 * - catalogue: the measured count at 100 %, rescaled (running and satin × scale, fill × scale²).
 * - svg: paths and basic shapes, in mm from the file's size or `size`. A filled shape whose equivalent column is
 *   narrower than `satinMaxWidthMm` is satin, else fill; a stroke under `satinMinStrokeWidthMm` is running
 *   stitch (`data-stitch="double"`, `"triple"` or `"bean"` on the element or a group multiplies the passes),
 *   a wider one satin, and one at least `satinMaxWidthMm` wide a fill. Widths are judged at the artwork's own
 *   size (as drawn), so resizing with `size` changes the counts but never a shape's stitch type.
 * - svg-figures: the same, from what `measureSvgArtwork` measured of the file once (an upload's stored figures).
 * - lettering: glyph outlines from the font, measured like filled shapes, at a capital-H height in mm.
 * `settings` overrides the published defaults (`DEFAULT_STITCH_SETTINGS`, lengths in mm); catalogue motifs do
 * not use them, as their count is measured. A result that cannot be counted exactly (infinite, or past
 * `Number.MAX_SAFE_INTEGER` stitches) is refused with a reason, whatever the source.
 */
export function estimateStitches(
  source: StitchSource,
  settings?: Partial<StitchSettings>,
): EngineResult<StitchEstimate> {
  const estimate = estimateFrom(source, settings);
  return estimate.ok ? countable(estimate) : estimate;
}

function estimateFrom(source: StitchSource, settings?: Partial<StitchSettings>): EngineResult<StitchEstimate> {
  if (!isRecord(source)) return fail('Nothing was given to estimate.');
  const resolved = resolveStitchSettings(settings);
  if ('reason' in resolved) return resolved;
  switch (source.kind) {
    case 'catalogue':
      return estimateCatalogueStitches(source.motif, source.scale);
    case 'svg':
      return estimateSvgStitches(source.svgText, source.size, resolved);
    case 'svg-figures':
      return estimateSvgFigures(source.figures, source.size, resolved);
    case 'lettering':
      return estimateLetteringStitches(source.text, source.font, source.letterHeightMm, resolved);
    default:
      return fail('The design source must be a catalogue motif, SVG artwork or lettering.');
  }
}

function countable(estimate: { ok: true } & StitchEstimate): EngineResult<StitchEstimate> {
  const counts = [estimate.stitches, estimate.colorChanges, estimate.trims, ...Object.values(estimate.byType)];
  if (!counts.every((count) => Number.isSafeInteger(count) && count >= 0))
    return fail(
      'The design would need more stitches than can be counted; it is far too large, so draw it at an ordinary size.',
    );
  if (!Number.isFinite(estimate.widthMm) || !Number.isFinite(estimate.heightMm))
    return fail('The design is too large to measure; draw it at an ordinary size.');
  return estimate;
}
