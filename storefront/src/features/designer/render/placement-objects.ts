import { FabricImage, FabricText, Group, Rect, Shadow, loadSVGFromString, util, type FabricObject } from 'fabric/es';
import type { Drawable } from './describe-scene.ts';
import { registerSvgShapes } from './svg-shapes.ts';

registerSvgShapes();

/** Madder, the storefront's accent, for the selection outline. */
const SELECTION_COLOUR = '#9c4230';

/** How every placement behaves on the canvas: moved by dragging, sized from the panel (artwork also by its corners). */
const interactive = {
  originX: 'center',
  originY: 'center',
  hasControls: false,
  borderColor: SELECTION_COLOUR,
  borderScaleFactor: 2,
  padding: 4,
  hoverCursor: 'grab',
  moveCursor: 'grabbing',
} as const;

/** A drawn placement: its Fabric object, drawn in millimetre units, and the mockup point its centre sits at. */
export interface PlacementObject {
  object: FabricObject;
  /** A border's centre along the hem is fixed by its repeats; items are centred where the document says. */
  centerXMm: (drawable: Drawable) => number;
  /**
   * How far the object's centre sits below the document's centre, mm: 0 for items; for a border on a curved hem,
   * where its box's middle lies below the centre line at the middle of the front.
   */
  offsetYMm: number;
}

async function motifGroup(svg: string, widthMm: number): Promise<FabricObject> {
  const { objects, options } = await loadSVGFromString(svg);
  const group = util.groupSVGElements(
    objects.filter((object) => object !== null),
    options,
  );
  if (!(group.width > 0)) throw new Error('The motif drawing has nothing in it to draw');
  group.scale(widthMm / group.width);
  return group;
}

/** Thread has a little depth on fabric; a soft shadow a fraction of a millimetre long suggests it. */
const threadShadow = () => new Shadow({ color: 'rgba(46, 36, 30, 0.28)', blur: 0.6, offsetX: 0.15, offsetY: 0.25 });

/**
 * Builds the Fabric object for a drawable in millimetre units (the sync scales it to the view), so a new zoom or
 * window size only rescales and never rebuilds. SVG motifs load asynchronously.
 */
export async function buildPlacementObject(drawable: Drawable): Promise<PlacementObject> {
  if (drawable.kind === 'lettering') {
    const text = new FabricText(drawable.text, {
      ...interactive,
      fontFamily: drawable.fontFamily,
      fontSize: drawable.fontSizeMm,
      fill: drawable.fill,
      shadow: threadShadow(),
    });
    return { object: text, centerXMm: (current) => current.centerXMm, offsetYMm: 0 };
  }
  if (drawable.kind === 'artwork') {
    // Drawn as a picture (an SVG upload too): the browser renders it sandboxed, as the server's policy asks.
    const image = await FabricImage.fromURL(drawable.src);
    if (!(image.width > 0)) throw new Error('The artwork has nothing in it to draw');
    image.set({ originX: 'center', originY: 'center', left: 0, top: 0 });
    image.scale(drawable.widthMm / image.width);
    // Corner handles resize it about its centre, in proportion; the panel sets its width exactly.
    const wrapper = new Group([image], {
      ...interactive,
      hasControls: true,
      centeredScaling: true,
      lockScalingFlip: true,
      cornerColor: SELECTION_COLOUR,
      cornerSize: 14,
      transparentCorners: false,
    });
    wrapper.setControlsVisibility({ mt: false, mb: false, ml: false, mr: false, mtr: false });
    return { object: wrapper, centerXMm: (current) => current.centerXMm, offsetYMm: 0 };
  }
  if (drawable.kind === 'motif') {
    // Wrapped so that the outer object is in millimetres like the others: the SVG's own units are its pixels.
    const group = await motifGroup(drawable.svg, drawable.widthMm);
    group.set({ originX: 'center', originY: 'center', left: 0, top: 0 });
    const wrapper = new Group([group], { ...interactive, shadow: threadShadow() });
    return { object: wrapper, centerXMm: (current) => current.centerXMm, offsetYMm: 0 };
  }
  // Repeats are placed relative to the border's centre line at the middle of the front (y = 0): on it for a
  // straight hem, risen and turned along a curved one. Along the hem they keep their own positions, and past the
  // front panel's ends they are round the back, so the band clips them.
  const { band } = drawable;
  const repeats = await Promise.all(
    drawable.repeats.map(async (repeat) => {
      const group = await motifGroup(drawable.svg, repeat.widthMm);
      group.set({
        originX: 'center',
        originY: 'center',
        left: repeat.centerXMm,
        top: repeat.centerYMm - band.centerYMm,
        angle: repeat.rotationDeg,
      });
      return group;
    }),
  );
  const border = new Group(repeats, {
    ...interactive,
    lockMovementX: true,
    hoverCursor: 'ns-resize',
    moveCursor: 'ns-resize',
    shadow: threadShadow(),
  });
  const { x: centreXMm, y: centreYMm } = border.getCenterPoint();
  border.clipPath = new Rect({
    originX: 'center',
    originY: 'center',
    left: band.leftMm + band.widthMm / 2 - centreXMm,
    top: 0,
    width: band.widthMm,
    height: border.height + 10,
  });
  return { object: border, centerXMm: () => centreXMm, offsetYMm: centreYMm };
}
