import type { PlacementZoneSummary } from '@server/contracts/catalogue.ts';
import type { DesignPlacement } from '@server/contracts/designs.ts';
// Straight from their modules: the engine's entry also registers colour spaces at load, which the designer does not need.
import { findFreeCentre } from '@server/engine/free-space.ts';
import { findOverlaps, type PlacementOutline, type PlacementOverlap } from '@server/engine/placement-overlap.ts';
import { layoutBorder } from './border-layout.ts';
import type { DesignSetting } from './design-setting.ts';
import { isItem, type DesignerState, type ItemPlacement } from './designer-state.ts';
import { itemExtent, uprightExtent } from './item-extent.ts';

/** A placement's outlines on the mockup, mm: an item's turned box, or each border repeat that shows on the front. */
function outlinesOf(setting: DesignSetting, sizeId: number, placement: DesignPlacement): PlacementOutline[] {
  if (isItem(placement)) {
    const { widthMm, heightMm } = uprightExtent(setting, placement);
    if (widthMm <= 0 || heightMm <= 0) return [];
    const { centerXMm, centerYMm, rotationDeg } = placement;
    return [{ placementId: placement.id, centerXMm, centerYMm, widthMm, heightMm, rotationDeg }];
  }
  const layout = layoutBorder(setting, sizeId, placement);
  return layout.ok ? layout.repeats.map((repeat) => ({ placementId: placement.id, ...repeat })) : [];
}

/** Every placement's outlines in the design as it stands, in the document's order. */
export function designOutlines(setting: DesignSetting, state: Pick<DesignerState, 'document' | 'sizeId'>) {
  return state.document.placements.flatMap((placement) => outlinesOf(setting, state.sizeId, placement));
}

/** The pairs of placements that would be stitched over each other (the engine's one overlap rule). */
export const designOverlaps = (
  setting: DesignSetting,
  state: Pick<DesignerState, 'document' | 'sizeId'>,
): PlacementOverlap[] => findOverlaps(designOutlines(setting, state));

/**
 * An item put in the middle of the largest free part of its zone that holds it (the engine's free-space rule),
 * clear of everything else on the garment; in the zone's centre when nothing there is free, where the overlap
 * warning then shows. Used when an item is added or moved to another zone.
 */
export function placeFreely<T extends ItemPlacement>(
  setting: DesignSetting,
  state: DesignerState,
  zone: PlacementZoneSummary,
  item: T,
): T {
  const others = designOutlines(setting, state).filter((outline) => outline.placementId !== item.id);
  const { centerXMm, centerYMm } = findFreeCentre({ zone, extent: itemExtent(setting, item), others });
  return { ...item, zone: zone.code, centerXMm, centerYMm };
}
