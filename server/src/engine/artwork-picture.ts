/**
 * Where the customer's uploaded picture is drawn in any picture of a design (the proof, the order page, saved and
 * shared designs, the production sheet): `widthMm` wide as the design says, its height in the upload's own
 * proportions, centred on the placement and turned with it. The one rule every renderer draws an upload by.
 */
export interface ArtworkPictureBox {
  xMm: number;
  yMm: number;
  widthMm: number;
  heightMm: number;
  /** An SVG `transform` turning it about its centre, or undefined when it is not turned. */
  transform: string | undefined;
}

const round = (value: number) => Math.round(value * 1000) / 1000;

/** The upload's height at `widthMm`, mm, from its pixel (or viewBox) proportions. */
export function artworkHeightMm(widthMm: number, size: { widthPx: number; heightPx: number }): number {
  return (widthMm * size.heightPx) / size.widthPx;
}

export function artworkPictureBox(
  placement: { centerXMm: number; centerYMm: number; widthMm: number; rotationDeg: number },
  size: { widthPx: number; heightPx: number },
): ArtworkPictureBox {
  const heightMm = artworkHeightMm(placement.widthMm, size);
  const { centerXMm: cx, centerYMm: cy, rotationDeg } = placement;
  return {
    xMm: round(cx - placement.widthMm / 2),
    yMm: round(cy - heightMm / 2),
    widthMm: round(placement.widthMm),
    heightMm: round(heightMm),
    transform: rotationDeg === 0 ? undefined : `rotate(${round(rotationDeg)} ${round(cx)} ${round(cy)})`,
  };
}

/** The box as an SVG `<image>` element's attributes, for renderers that write SVG text. */
export function artworkImageMarkup(box: ArtworkPictureBox, href: string): string {
  const turn = box.transform ? ` transform="${box.transform}"` : '';
  return `<image href="${href}" x="${box.xMm}" y="${box.yMm}" width="${box.widthMm}" height="${box.heightMm}" preserveAspectRatio="none"${turn}/>`;
}
