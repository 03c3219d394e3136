import type { Canvas, FabricImage, FabricObject } from 'fabric/es';
import type { PlacementZoneSummary } from '@server/contracts/catalogue.ts';
import { mm, toPx, type DesignView } from '../model/view.ts';
import type { Drawable } from './describe-scene.ts';
import { fitMockup, loadMockup } from './mockup-background.ts';
import { buildPlacementObject, type PlacementObject } from './placement-objects.ts';
import { buildZoneGuides, type ZoneGuides } from './zone-guides.ts';

/** Everything the canvas shows, derived from the design document; the canvas never holds state of its own. */
export interface Scene {
  drawables: Drawable[];
  view: DesignView;
  mockupSrc: string;
  zones: readonly PlacementZoneSummary[];
  selectedId: string | null;
  /** The selected placement's zone, outlined more strongly while the guides show. */
  selectedZone: string | null;
}

interface Mockup {
  src: string;
  /** Set once loaded; a newer colour may have been chosen by then. */
  image?: FabricImage;
}

/**
 * Keeps a Fabric canvas in step with the scene, one way: objects are built when their drawing changes (motif SVGs
 * load asynchronously; a build overtaken by a newer one is dropped) and otherwise only moved and scaled.
 */
export function createSceneSync(canvas: Canvas) {
  const built = new Map<string, { key: string; drawn: PlacementObject }>();
  const building = new Map<string, string>();
  const idByObject = new WeakMap<FabricObject, string>();
  let latest: Scene | undefined;
  let guides: { key: string; guides: ZoneGuides } | undefined;
  let mockup: Mockup | undefined;
  let isEchoing = false;
  let isDisposed = false;

  const drawableOf = (id: string) => latest?.drawables.find((drawable) => drawable.id === id);

  function place({ drawn }: { drawn: PlacementObject }, drawable: Drawable, view: DesignView) {
    drawn.object.set({
      left: toPx(view, mm(drawn.centerXMm(drawable))),
      top: toPx(view, mm(drawable.centerYMm + drawn.offsetYMm)),
      scaleX: view.pxPerMm,
      scaleY: view.pxPerMm,
      angle: drawable.rotationDeg,
    });
    drawn.object.setCoords();
  }

  async function build(drawable: Drawable) {
    building.set(drawable.id, drawable.key);
    let drawn: PlacementObject;
    try {
      drawn = await buildPlacementObject(drawable);
    } catch (error) {
      // The placement stays in the list and is priced; only its drawing is missing, and the next change retries.
      if (building.get(drawable.id) === drawable.key) building.delete(drawable.id);
      console.error(`Could not draw placement ${drawable.id}`, error);
      return;
    }
    if (isDisposed || building.get(drawable.id) !== drawable.key) return;
    building.delete(drawable.id);
    const current = drawableOf(drawable.id);
    if (!current || current.key !== drawable.key || !latest) return;
    const scene = latest;
    echoing(() => {
      const old = built.get(drawable.id);
      if (old) canvas.remove(old.drawn.object);
      const entry = { key: drawable.key, drawn };
      built.set(drawable.id, entry);
      idByObject.set(drawn.object, drawable.id);
      canvas.add(drawn.object);
      place(entry, current, scene.view);
      arrange(scene);
    });
  }

  async function showMockup(scene: Scene) {
    if (mockup?.src === scene.mockupSrc) {
      if (mockup.image) fitMockup(canvas, mockup.image, scene.view);
      return;
    }
    const wanted: Mockup = { src: scene.mockupSrc };
    mockup = wanted;
    const image = await loadMockup(scene.mockupSrc).catch((error: unknown) => {
      // Without its drawing the garment shows as plain linen; the design itself still works and is priced.
      console.error('Could not draw the garment', error);
      return undefined;
    });
    if (!image || isDisposed || mockup !== wanted || !latest) return;
    wanted.image = image;
    fitMockup(canvas, image, latest.view);
    canvas.requestRenderAll();
  }

  function showGuides(scene: Scene) {
    const key = JSON.stringify([scene.zones, scene.view.pxPerMm]);
    if (guides?.key !== key) {
      if (guides) canvas.remove(...guides.guides.objects);
      guides = { key, guides: buildZoneGuides(scene.zones, scene.view) };
      canvas.insertAt(0, ...guides.guides.objects);
    }
    guides.guides.show(scene.selectedId === null ? null : scene.selectedZone);
  }

  /** Stacks placements in document order above the guides, and mirrors the document's selection. */
  function arrange(scene: Scene) {
    const base = guides?.guides.objects.length ?? 0;
    scene.drawables.forEach((drawable, index) => {
      const entry = built.get(drawable.id);
      if (entry) canvas.moveObjectTo(entry.drawn.object, base + index);
    });
    const wanted = scene.selectedId === null ? undefined : built.get(scene.selectedId)?.drawn.object;
    const active = canvas.getActiveObject();
    if (wanted && active !== wanted) canvas.setActiveObject(wanted);
    if (!wanted && active) canvas.discardActiveObject();
    canvas.requestRenderAll();
  }

  /**
   * Fabric announces selection changes as events, also when the sync makes them (removing the selected object
   * clears the selection). Those echo the document, so they must not go back into it as commands.
   */
  function echoing(change: () => void) {
    isEchoing = true;
    try {
      change();
    } finally {
      isEchoing = false;
    }
  }

  function sync(scene: Scene) {
    echoing(() => show(scene));
  }

  function show(scene: Scene) {
    latest = scene;
    // Resizing a canvas clears it, so only a new view resizes; drags sync many times a second.
    if (canvas.width !== scene.view.widthPx || canvas.height !== scene.view.heightPx)
      canvas.setDimensions({ width: scene.view.widthPx, height: scene.view.heightPx });
    void showMockup(scene);
    showGuides(scene);
    for (const [id, entry] of built) {
      if (drawableOf(id)) continue;
      canvas.remove(entry.drawn.object);
      built.delete(id);
    }
    for (const drawable of scene.drawables) {
      const entry = built.get(drawable.id);
      if (entry?.key !== drawable.key && building.get(drawable.id) !== drawable.key) void build(drawable);
      if (entry) place(entry, drawable, scene.view);
    }
    arrange(scene);
  }

  return {
    sync,
    /** Puts every object back where the document has it: after a drag or resize the document refused or clamped. */
    resync: () => {
      if (latest && !isDisposed) sync(latest);
    },
    placementIdOf: (object: FabricObject | undefined) => (object ? idByObject.get(object) : undefined),
    /** How far an object's centre sits below its placement's centre in the document, mm (see PlacementObject). */
    offsetYMmOf: (id: string) => built.get(id)?.drawn.offsetYMm ?? 0,
    isEchoing: () => isEchoing,
    dispose: () => {
      isDisposed = true;
    },
  };
}

export type SceneSync = ReturnType<typeof createSceneSync>;
