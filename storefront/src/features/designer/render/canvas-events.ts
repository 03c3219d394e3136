import type { Canvas, FabricObject } from 'fabric/es';
import type { Dispatch } from '../commands/command-registry.ts';
import { px, toMm, type DesignView } from '../model/view.ts';
import type { SceneSync } from './scene-sync.ts';

/** Long enough for the dispatched change to reach the canvas first, too short to notice. */
const RESYNC_AFTER_MS = 50;

/**
 * Turns what the customer does on the canvas into commands; nothing here writes to the design itself. A drag
 * previews on every pointer move and commits once on release; clicking an item selects it.
 */
export function translateCanvasEvents(
  canvas: Canvas,
  sync: SceneSync,
  viewOf: () => DesignView,
  dispatch: Dispatch,
): () => void {
  const target = (object: FabricObject) => {
    const id = sync.placementIdOf(object);
    if (id === undefined) return undefined;
    const view = viewOf();
    const centre = object.getCenterPoint();
    return { id, centerXMm: toMm(view, px(centre.x)), centerYMm: toMm(view, px(centre.y)) - sync.offsetYMmOf(id) };
  };
  const selected = (objects: FabricObject[] | undefined) => {
    if (!sync.isEchoing()) dispatch('select-placement', { id: sync.placementIdOf(objects?.[0]) ?? null });
  };
  return canvas.on({
    'object:moving': ({ target: object }) => {
      const moved = target(object);
      if (moved) dispatch('drag-placement', moved);
    },
    'object:modified': ({ target: object }) => {
      const moved = target(object);
      if (!moved) return;
      // Objects are drawn in mm and scaled by the view, so a resize by the corner handles shows in the scale.
      const scaledWidthMm = (object.width * object.scaleX) / viewOf().pxPerMm;
      if (Math.abs(object.scaleX / viewOf().pxPerMm - 1) > 1e-3)
        dispatch('update-artwork', { id: moved.id, widthMm: scaledWidthMm });
      else dispatch('move-placement', moved);
      // A change the document clamps to what it already was renders no new scene, so once the design has had its
      // turn to re-render, put every object back where the document has it.
      setTimeout(() => sync.resync(), RESYNC_AFTER_MS);
    },
    'selection:created': ({ selected: objects }) => selected(objects),
    'selection:updated': ({ selected: objects }) => selected(objects),
    'selection:cleared': () => selected(undefined),
  });
}
