import type { EngineResult } from './engine-result.ts';
import type { StitchEstimate } from './stitch-estimate.ts';
import type { StitchSettings } from './stitch-settings.ts';
import { estimateSvgFigures, measureSvgArtwork, type SvgSize } from './svg-artwork-figures.ts';

export type { SvgSize };

/**
 * Stitches for SVG artwork: measured (`measureSvgArtwork`), then counted at the size (`estimateSvgFigures`), the
 * same two steps an upload takes once and its quotes take each time.
 */
export function estimateSvgStitches(
  svgText: string,
  size: SvgSize | undefined,
  settings: StitchSettings,
): EngineResult<StitchEstimate> {
  const measured = measureSvgArtwork(svgText, settings);
  if (!measured.ok) return measured;
  return estimateSvgFigures(measured.figures, size, settings);
}
