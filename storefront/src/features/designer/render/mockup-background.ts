import { FabricImage, type Canvas } from 'fabric/es';
import type { DesignView } from '../model/view.ts';

/**
 * The dyed garment drawing as the canvas's background: locked, never selectable, and scaled to fill the view. It is
 * loaded as an image, as on the garment pages, so any markup in the drawing stays inert.
 */
export async function loadMockup(src: string): Promise<FabricImage> {
  const image = await FabricImage.fromURL(src);
  image.set({ originX: 'left', originY: 'top', left: 0, top: 0, selectable: false, evented: false });
  return image;
}

export function fitMockup(canvas: Canvas, image: FabricImage, view: DesignView): void {
  image.set({ scaleX: view.widthPx / image.width, scaleY: view.heightPx / image.height });
  canvas.backgroundImage = image;
}
