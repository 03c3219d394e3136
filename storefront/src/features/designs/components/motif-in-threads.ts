import { recolourThreadGroups } from '@server/engine/recolour-threads.ts';
import { svgDataUrl } from '@ui/svg-data-url.ts';

/** A motif drawing painted in the design's threads (see recolourThreadGroups), as an image URL. */
export function motifInThreadsSrc(svg: string, threadHexes: readonly (string | undefined)[]): string {
  const drawing = new DOMParser().parseFromString(svg, 'image/svg+xml');
  recolourThreadGroups(drawing.documentElement, threadHexes);
  return svgDataUrl(new XMLSerializer().serializeToString(drawing));
}
