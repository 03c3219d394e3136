const PAINTS = ['fill', 'stroke'] as const;

/**
 * A motif drawing painted in the design's threads, as an image URL. Catalogue drawings keep one group per thread
 * colour in stitching order (`data-colour="1"`, `"2"`, …); every painted fill and stroke in group n takes thread n.
 * A colour whose thread is unknown keeps the drawing's own paint.
 */
export function motifInThreadsSrc(svg: string, threadHexes: readonly (string | undefined)[]): string {
  const drawing = new DOMParser().parseFromString(svg, 'image/svg+xml');
  drawing.querySelectorAll('[data-colour]').forEach((group) => {
    const hex = threadHexes[Number(group.getAttribute('data-colour')) - 1];
    if (hex === undefined) return;
    [group, ...Array.from(group.querySelectorAll('*'))].forEach((element) => {
      PAINTS.filter((paint) => (element.getAttribute(paint) ?? 'none') !== 'none').forEach((paint) => element.setAttribute(paint, hex));
    });
  });
  return `data:image/svg+xml;charset=utf-8,${encodeURIComponent(new XMLSerializer().serializeToString(drawing))}`;
}
