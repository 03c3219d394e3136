/** The scene is described on every change, drags included; parsing each drawing once per set of threads is enough. */
const recoloured = new Map<string, string>();

/**
 * A motif's artwork in the chosen threads. Each catalogue drawing has one group per thread colour, in stitching
 * order (`data-colour="1"`, `"2"`, …), so every painted fill and stroke inside group n takes thread n's colour. A
 * colour without a known thread keeps the drawing's own.
 */
export function recolourMotif(svg: string, threadHexes: readonly (string | undefined)[]): string {
  const cacheKey = `${threadHexes.join(',')}|${svg}`;
  const cached = recoloured.get(cacheKey);
  if (cached !== undefined) return cached;
  const drawing = new DOMParser().parseFromString(svg, 'image/svg+xml');
  for (const group of drawing.querySelectorAll('[data-colour]')) {
    const hex = threadHexes[Number(group.getAttribute('data-colour')) - 1];
    if (!hex) continue;
    for (const element of [group, ...group.querySelectorAll('*')]) {
      for (const paint of ['fill', 'stroke']) {
        const value = element.getAttribute(paint);
        if (value && value !== 'none') element.setAttribute(paint, hex);
      }
    }
  }
  const result = new XMLSerializer().serializeToString(drawing);
  recoloured.set(cacheKey, result);
  return result;
}
