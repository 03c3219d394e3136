import { useEffect, useMemo, useRef, useState, type RefObject } from 'react';
import { Canvas } from 'fabric/es';
import { fitView, mm, px } from '../model/view.ts';
import type { ExtentMm } from '../model/design-setting.ts';
import type { Dispatch } from '../commands/command-registry.ts';
import { translateCanvasEvents } from '../render/canvas-events.ts';
import { createSceneSync, type Scene, type SceneSync } from '../render/scene-sync.ts';

/** The garment should fill its column yet stay on screen whole, with its toolbar above and its help below. */
const TOOLS_AND_HELP_PX = 200;
const MIN_HEIGHT_PX = 320;

/** The container's width and the window's height, followed as they change. */
function useBox(host: RefObject<HTMLDivElement | null>) {
  const [box, setBox] = useState({ widthPx: 0, heightPx: 0 });
  useEffect(() => {
    const element = host.current;
    if (!element) return;
    const measure = () => {
      const next = {
        widthPx: element.clientWidth,
        heightPx: Math.max(MIN_HEIGHT_PX, window.innerHeight - TOOLS_AND_HELP_PX),
      };
      setBox((current) => (current.widthPx === next.widthPx && current.heightPx === next.heightPx ? current : next));
    };
    const observer = new ResizeObserver(measure);
    observer.observe(element);
    window.addEventListener('resize', measure);
    return () => {
      observer.disconnect();
      window.removeEventListener('resize', measure);
    };
  }, [host]);
  return box;
}

/**
 * Owns the Fabric canvas: creates it on mount and disposes of it on unmount (disposal is asynchronous, and React's
 * strict mode mounts twice, so each mount makes its own canvas element), sizes it to the container (Fabric scales
 * for the device pixel ratio itself), and syncs it from the scene whenever the design or the view changes.
 */
export function DesignCanvas({
  scene,
  mockupSizeMm,
  dispatch,
  label,
}: {
  scene: Omit<Scene, 'view'>;
  mockupSizeMm: ExtentMm;
  dispatch: Dispatch;
  label: string;
}) {
  const host = useRef<HTMLDivElement>(null);
  const box = useBox(host);
  const { widthMm, heightMm } = mockupSizeMm;
  const view = useMemo(
    () =>
      fitView(
        { widthMm: mm(widthMm), heightMm: mm(heightMm) },
        { widthPx: px(box.widthPx), heightPx: px(box.heightPx) },
      ),
    [widthMm, heightMm, box],
  );
  const [live, setLive] = useState<{ canvas: Canvas; sync: SceneSync }>();
  const latest = useRef({ view, dispatch });
  useEffect(() => {
    latest.current = { view, dispatch };
  });

  useEffect(() => {
    const mount = document.createElement('div');
    const element = document.createElement('canvas');
    mount.append(element);
    host.current?.append(mount);
    const canvas = new Canvas(element, {
      selection: false,
      preserveObjectStacking: true,
      allowTouchScrolling: true,
      enableRetinaScaling: true,
    });
    const sync = createSceneSync(canvas);
    const unbind = translateCanvasEvents(
      canvas,
      sync,
      () => latest.current.view,
      (id, args) => latest.current.dispatch(id, args),
    );
    setLive({ canvas, sync });
    return () => {
      unbind();
      sync.dispose();
      mount.remove();
      void canvas.dispose();
    };
  }, []);

  useEffect(() => {
    if (live && view.pxPerMm > 0) live.sync.sync({ ...scene, view });
  }, [live, scene, view]);

  return (
    <div
      ref={host}
      tabIndex={0}
      role="group"
      aria-label={label}
      aria-describedby="canvas-help"
      className="flex w-full min-w-0 justify-center overflow-hidden rounded-card bg-linen-100 outline-offset-4"
      style={{ minHeight: view.heightPx || undefined }}
    />
  );
}
