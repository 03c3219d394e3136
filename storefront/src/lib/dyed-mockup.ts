import { svgDataUrl } from '@ui/svg-data-url.ts';

/**
 * A garment's outline drawing in a fabric colour, as an image URL. Each drawing paints its fabric with
 * `currentColor`, so setting the root element's `color` dyes it. It is meant for an <img> or a canvas image, where
 * any markup in the drawing stays inert.
 */
export function dyedMockupSrc(mockupSvg: string, colourHex: string | undefined): string {
  const dyed = colourHex
    ? mockupSvg.replace(/<svg\b[^>]*>/, (root) =>
        root.replace(/\scolor="[^"]*"/, '').replace(/^<svg/, `<svg color="${colourHex}"`),
      )
    : mockupSvg;
  return svgDataUrl(dyed);
}
