import { fail, type EngineResult } from './engine-result.ts';
import { isRecord } from './input-checks.ts';
import { estimateCatalogueStitches, type CatalogueMotif } from './estimate-catalogue-stitches.ts';
import { estimateLetteringStitches, type GlyphOutlineSource } from './estimate-lettering-stitches.ts';
import { estimateSvgStitches, type SvgSize } from './estimate-svg-stitches.ts';
import type { StitchEstimate } from './stitch-estimate.ts';
import { resolveStitchSettings, type StitchSettings } from './stitch-settings.ts';

/** What to estimate: a catalogue motif at a scale, SVG artwork, or lettering. */
export type StitchSource =
  | { kind: 'catalogue'; motif: CatalogueMotif; scale: number }
  | { kind: 'svg'; svgText: string; size?: SvgSize }
  | { kind: 'lettering'; text: string; font: GlyphOutlineSource; letterHeightMm: number };

/**
 * Estimates stitches, colour changes and trims for one design source, with its stitched width and height in mm.
 * - catalogue: the measured count at 100 %, rescaled (running and satin × scale, fill × scale²).
 * - svg: paths and basic shapes, in mm from the file's size or `size`. A filled shape whose equivalent column is
 *   narrower than `satinMaxWidthMm` is satin, else fill; a stroke under `satinMinStrokeWidthMm` is running
 *   stitch (`data-stitch="double"`, `"triple"` or `"bean"` on the element or a group multiplies the passes),
 *   a wider one satin, and one at least `satinMaxWidthMm` wide a fill. Widths are judged at the artwork's own
 *   size (as drawn), so resizing with `size` changes the counts but never a shape's stitch type.
 * - lettering: glyph outlines from the font, measured like filled shapes, at a capital-H height in mm.
 * `settings` overrides the published defaults (`DEFAULT_STITCH_SETTINGS`, lengths in mm); catalogue motifs do
 * not use them, as their count is measured.
 */
export function estimateStitches(
  source: StitchSource,
  settings?: Partial<StitchSettings>,
): EngineResult<StitchEstimate> {
  if (!isRecord(source)) return fail('Nothing was given to estimate.');
  const resolved = resolveStitchSettings(settings);
  if ('reason' in resolved) return resolved;
  switch (source.kind) {
    case 'catalogue':
      return estimateCatalogueStitches(source.motif, source.scale);
    case 'svg':
      return estimateSvgStitches(source.svgText, source.size, resolved);
    case 'lettering':
      return estimateLetteringStitches(source.text, source.font, source.letterHeightMm, resolved);
    default:
      return fail('The design source must be a catalogue motif, SVG artwork or lettering.');
  }
}
