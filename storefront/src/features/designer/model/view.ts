/**
 * Garment millimetres and screen pixels are different spaces; branding keeps a length in one from being used as the
 * other by accident. Every conversion between them lives in this file.
 */
export type Mm = number & { readonly unit: 'mm' };
export type Px = number & { readonly unit: 'px' };

export const mm = (value: number) => value as Mm;
export const px = (value: number) => value as Px;

export interface PointMm {
  xMm: Mm;
  yMm: Mm;
}
export interface PointPx {
  xPx: Px;
  yPx: Px;
}

/** How the garment is drawn on screen: the mockup's top left corner is the canvas origin. */
export interface DesignView {
  pxPerMm: number;
  widthPx: Px;
  heightPx: Px;
}

/**
 * The largest view that shows the whole mockup inside a box, keeping the drawing to scale; `box.heightPx` caps the
 * height so a tall garment still fits on screen.
 */
export function fitView(mockup: { widthMm: Mm; heightMm: Mm }, box: { widthPx: Px; heightPx: Px }): DesignView {
  const pxPerMm = Math.max(0, Math.min(box.widthPx / mockup.widthMm, box.heightPx / mockup.heightMm));
  return {
    pxPerMm,
    widthPx: px(Math.floor(mockup.widthMm * pxPerMm)),
    heightPx: px(Math.floor(mockup.heightMm * pxPerMm)),
  };
}

export const toPx = (view: DesignView, length: Mm): Px => px(length * view.pxPerMm);

export const toMm = (view: DesignView, length: Px): Mm => mm(view.pxPerMm === 0 ? 0 : length / view.pxPerMm);

export const pointToPx = (view: DesignView, point: PointMm): PointPx => ({
  xPx: toPx(view, point.xMm),
  yPx: toPx(view, point.yMm),
});

export const pointToMm = (view: DesignView, point: PointPx): PointMm => ({
  xMm: toMm(view, point.xPx),
  yMm: toMm(view, point.yPx),
});
