import { recolourThreadGroups } from '@server/engine/recolour-threads.ts';

/** The scene is described on every change, drags included; parsing each drawing once per set of threads is enough. */
const recoloured = new Map<string, string>();

/** A motif's artwork in the chosen threads (see recolourThreadGroups), as SVG text for Fabric to load. */
export function recolourMotif(svg: string, threadHexes: readonly (string | undefined)[]): string {
  const cacheKey = `${threadHexes.join(',')}|${svg}`;
  const cached = recoloured.get(cacheKey);
  if (cached !== undefined) return cached;
  const drawing = new DOMParser().parseFromString(svg, 'image/svg+xml');
  recolourThreadGroups(drawing.documentElement, threadHexes);
  const result = new XMLSerializer().serializeToString(drawing);
  recoloured.set(cacheKey, result);
  return result;
}
