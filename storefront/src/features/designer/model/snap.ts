import { sizeOf, zoneOf, type DesignSetting } from './design-setting.ts';
import { findPlacement, isItem, type DesignerState } from './designer-state.ts';

/** A dragged item this close to its zone's centre line lands on it: closer than a hand drags by eye. */
export const SNAP_TO_CENTRE_MM = 3;

/** Where a drag carries an item, pulled onto its zone's centre line (side to side) when it comes within snapping distance. */
export function snapToCentreLine(
  setting: DesignSetting,
  state: DesignerState,
  id: string,
  to: { centerXMm: number; centerYMm: number },
) {
  const placement = findPlacement(state, id);
  if (!placement || !isItem(placement)) return to;
  const zone = zoneOf(sizeOf(setting, state.sizeId), placement.zone);
  if (!zone) return to;
  const middleXMm = zone.xMm + zone.widthMm / 2;
  return Math.abs(to.centerXMm - middleXMm) <= SNAP_TO_CENTRE_MM ? { ...to, centerXMm: middleXMm } : to;
}
