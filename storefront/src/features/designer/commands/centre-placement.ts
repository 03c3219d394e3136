import { findPlacement, isItem } from '../model/designer-state.ts';
import { sizeOf, zoneOf } from '../model/design-setting.ts';
import { movePlacement } from '../model/settle.ts';
import type { EditCommand } from './command.ts';

export interface CentreArgs {
  /** The placement to centre; the selected one when left out. */
  id?: string;
}

/**
 * Puts an item on its zone's centre line, side to side: the garment's middle, where an embroiderer marks the centre
 * and a name or motif most often belongs.
 */
export const centrePlacement: EditCommand<CentreArgs, 'centre-placement'> = {
  id: 'centre-placement',
  label: 'Centre side to side',
  isRecorded: true,
  shortcuts: [{ key: 'c', args: {} }],
  perform(state, args, setting) {
    const placement = findPlacement(state, args.id ?? state.selectedId);
    if (!placement || !isItem(placement)) return state;
    const zone = zoneOf(sizeOf(setting, state.sizeId), placement.zone);
    if (!zone) return state;
    return movePlacement(setting, state, placement.id, {
      centerXMm: zone.xMm + zone.widthMm / 2,
      centerYMm: placement.centerYMm,
    });
  },
};
