import { sizeOf, zoneOf, type DesignSetting } from './design-setting.ts';
import type { ItemPlacement } from './designer-state.ts';

/**
 * How far an item's centre is from the middle of its zone, mm (right and down positive), so the panel can say where
 * it is in words, for those who move it with buttons or keys rather than by eye.
 */
export function offsetFromZoneMiddle(setting: DesignSetting, sizeId: number, item: ItemPlacement) {
  const zone = zoneOf(sizeOf(setting, sizeId), item.zone);
  if (!zone) return undefined;
  return {
    zone,
    dxMm: item.centerXMm - (zone.xMm + zone.widthMm / 2),
    dyMm: item.centerYMm - (zone.yMm + zone.heightMm / 2),
  };
}
