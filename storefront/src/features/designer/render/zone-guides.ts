import { FabricText, Rect, type FabricObject } from 'fabric/es';
import type { PlacementZoneSummary } from '@server/contracts/catalogue.ts';
import { mm, toPx, type DesignView } from '../model/view.ts';

const WALNUT_500 = '#7a6656';
const MADDER_600 = '#9c4230';

export interface ZoneGuides {
  objects: FabricObject[];
  /** Shows the guides, with the selected placement's own zone drawn a little stronger. */
  show: (activeZone: string | null) => void;
}

/** Faint dashed outlines of the places embroidery may go, each named, drawn in screen pixels for this view. */
export function buildZoneGuides(zones: readonly PlacementZoneSummary[], view: DesignView): ZoneGuides {
  const outlines = new Map<string, Rect>();
  const objects = zones.flatMap((zone) => {
    const outline = new Rect({
      originX: 'left',
      originY: 'top',
      left: toPx(view, mm(zone.xMm)),
      top: toPx(view, mm(zone.yMm)),
      width: toPx(view, mm(zone.widthMm)),
      height: toPx(view, mm(zone.heightMm)),
      fill: 'rgba(255, 255, 255, 0.16)',
      stroke: WALNUT_500,
      strokeWidth: 1,
      strokeDashArray: [6, 4],
      strokeUniform: true,
      selectable: false,
      evented: false,
      visible: false,
    });
    outlines.set(zone.code, outline);
    // Named just above its outline, so the name never sits under what is placed inside.
    const label = new FabricText(zone.label, {
      originX: 'left',
      originY: 'bottom',
      left: toPx(view, mm(zone.xMm)),
      top: toPx(view, mm(zone.yMm)) - 2,
      fontFamily: 'Poppins',
      fontSize: 11,
      fill: WALNUT_500,
      selectable: false,
      evented: false,
      visible: false,
    });
    return [outline, label];
  });
  return {
    objects,
    show(activeZone) {
      for (const object of objects) object.visible = activeZone !== null;
      for (const [code, outline] of outlines)
        outline.set({ stroke: code === activeZone ? MADDER_600 : WALNUT_500, opacity: code === activeZone ? 1 : 0.6 });
    },
  };
}
