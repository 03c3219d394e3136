import type { DesignUploadPicture } from '@server/contracts/artwork.ts';
import { artworkPictureBox } from '@server/engine/artwork-picture.ts';

/**
 * The customer's uploaded picture inside an SVG drawing of a design, in the mockup's millimetres: placed by the
 * engine's one rule (`artworkPictureBox`) that the proof and the production sheet draw uploads by too.
 */
export function ArtworkPicture({
  placement,
  upload,
}: {
  placement: { centerXMm: number; centerYMm: number; widthMm: number; rotationDeg: number };
  upload: DesignUploadPicture;
}) {
  const box = artworkPictureBox(placement, upload);
  return (
    <image
      href={upload.imageUrl}
      x={box.xMm}
      y={box.yMm}
      width={box.widthMm}
      height={box.heightMm}
      preserveAspectRatio="none"
      transform={box.transform}
    />
  );
}
