/** SVG text as an image address for `<img src>` (the CSP allows data: images). */
export const svgDataUrl = (svg: string): string => `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`;
