/** The part of a DOM element recolouring needs: the browser's Element and jsdom's both fit. */
export interface PaintableElement {
  getAttribute(name: string): string | null;
  setAttribute(name: string, value: string): void;
  querySelectorAll(selectors: string): Iterable<PaintableElement>;
}

/**
 * Paints a motif drawing in the chosen threads, in place. Each catalogue drawing has one group per thread colour,
 * in stitching order (`data-colour="1"`, `"2"`, …), so every painted fill and stroke inside group n takes thread
 * n's colour. A colour without a known thread keeps the drawing's own. Parsing and serializing are the caller's.
 */
export function recolourThreadGroups(root: PaintableElement, threadHexes: readonly (string | undefined)[]): void {
  for (const group of root.querySelectorAll('[data-colour]')) {
    const hex = threadHexes[Number(group.getAttribute('data-colour')) - 1];
    if (!hex) continue;
    for (const element of [group, ...group.querySelectorAll('*')]) {
      for (const paint of ['fill', 'stroke']) {
        const value = element.getAttribute(paint);
        if (value && value !== 'none') element.setAttribute(paint, hex);
      }
    }
  }
}
