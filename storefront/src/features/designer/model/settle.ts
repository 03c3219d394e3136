import type { PlacementZoneSummary } from '@server/contracts/catalogue.ts';
import type { BorderPlacement, DesignPlacement } from '@server/contracts/designs.ts';
import { borderBandHeightMm, layoutBorder } from './border-layout.ts';
import { clampCentre, clampHemOffset } from './clamp.ts';
import { defaultItemZone, HEM_ZONE, sizeOf, zoneOf, type DesignSetting } from './design-setting.ts';
import { findPlacement, isItem, replacePlacement, type DesignerState, type ItemPlacement } from './designer-state.ts';
import { itemExtent } from './item-extent.ts';

export const centreOfZone = (zone: PlacementZoneSummary) => ({
  centerXMm: zone.xMm + zone.widthMm / 2,
  centerYMm: zone.yMm + zone.heightMm / 2,
});

/**
 * Keeps an item wholly inside its zone at this size, so what the customer sees is what can be hooped; the document
 * itself is clamped, not only the drawing. Unchanged items come back as the same object.
 */
export function settleItem(setting: DesignSetting, sizeId: number, item: ItemPlacement): ItemPlacement {
  const size = sizeOf(setting, sizeId);
  const zone = zoneOf(size, item.zone) ?? defaultItemZone(size);
  if (!zone) return item;
  const centre = clampCentre(item, itemExtent(setting, item), zone);
  const isUnchanged =
    zone.code === item.zone && centre.centerXMm === item.centerXMm && centre.centerYMm === item.centerYMm;
  return isUnchanged ? item : { ...item, ...centre, zone: zone.code };
}

/** Keeps a border's band inside the hem zone by its hem offset; unchanged borders come back as the same object. */
export function settleBorder(setting: DesignSetting, sizeId: number, border: BorderPlacement): BorderPlacement {
  const zone = zoneOf(sizeOf(setting, sizeId), HEM_ZONE);
  if (!zone) return border;
  const hemOffsetMm = clampHemOffset(
    border.hemOffsetMm,
    borderBandHeightMm(layoutBorder(setting, sizeId, border)),
    zone,
  );
  return hemOffsetMm === border.hemOffsetMm ? border : { ...border, hemOffsetMm };
}

export function settlePlacement(setting: DesignSetting, sizeId: number, placement: DesignPlacement): DesignPlacement {
  if (placement.kind === 'border') return settleBorder(setting, sizeId, placement);
  return isItem(placement) ? settleItem(setting, sizeId, placement) : placement;
}

/** Replaces a placement with its settled version; the state is unchanged (same object) when nothing moved. */
export function withSettled(setting: DesignSetting, state: DesignerState, next: DesignPlacement): DesignerState {
  const settled = settlePlacement(setting, state.sizeId, next);
  return findPlacement(state, settled.id) === settled ? state : replacePlacement(state, settled);
}

/**
 * Moves a placement's centre towards a point on the mockup, mm. An item goes as near as its zone allows; a border
 * follows the hem, so only the height of its centre line counts.
 */
export function movePlacement(
  setting: DesignSetting,
  state: DesignerState,
  id: string,
  to: { centerXMm: number; centerYMm: number },
): DesignerState {
  const placement = findPlacement(state, id);
  if (!placement) return state;
  if (placement.kind === 'border') {
    const zone = zoneOf(sizeOf(setting, state.sizeId), HEM_ZONE);
    if (!zone) return state;
    const settled = settleBorder(setting, state.sizeId, {
      ...placement,
      hemOffsetMm: zone.yMm + zone.heightMm - to.centerYMm,
    });
    return settled.hemOffsetMm === placement.hemOffsetMm ? state : replacePlacement(state, settled);
  }
  if (!isItem(placement)) return state;
  const settled = settleItem(setting, state.sizeId, { ...placement, ...to });
  return settled.centerXMm === placement.centerXMm && settled.centerYMm === placement.centerYMm
    ? state
    : replacePlacement(state, settled);
}

/** Where a placement's centre is on the mockup, mm (a border's centre line is at the middle of the hem zone). */
export function centreOf(setting: DesignSetting, state: DesignerState, placement: DesignPlacement) {
  if (placement.kind !== 'border') return { centerXMm: placement.centerXMm, centerYMm: placement.centerYMm };
  const zone = zoneOf(sizeOf(setting, state.sizeId), HEM_ZONE);
  const middleXMm = zone ? zone.xMm + zone.widthMm / 2 : 0;
  return { centerXMm: middleXMm, centerYMm: zone ? zone.yMm + zone.heightMm - placement.hemOffsetMm : 0 };
}
