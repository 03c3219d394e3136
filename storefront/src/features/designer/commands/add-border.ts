import type { BorderPlacement } from '@server/contracts/designs.ts';
import { appendPlacement, hasRoomForPlacement, nextPlacementId } from '../model/designer-state.ts';
import { HEM_ZONE, motifOf, sizeOf, zoneOf } from '../model/design-setting.ts';
import { settleBorder } from '../model/settle.ts';
import type { EditCommand } from './command.ts';

export interface AddBorderArgs {
  motif: string;
  run: BorderPlacement['run'];
}

/**
 * Puts a border along the hem, its centre line at the zone's usual height above the hem edge and in the motif's
 * own threads. A hem takes one border, so this does nothing when there is one already.
 */
export const addBorder: EditCommand<AddBorderArgs, 'add-border'> = {
  id: 'add-border',
  label: 'Add this border',
  isRecorded: true,
  perform(state, args, setting) {
    const motif = motifOf(setting, args.motif);
    const zone = zoneOf(sizeOf(setting, state.sizeId), HEM_ZONE);
    const hasBorder = state.document.placements.some((placement) => placement.kind === 'border');
    if (!motif || motif.kind !== 'border' || !zone || hasBorder || !hasRoomForPlacement(state)) return state;
    const border: BorderPlacement = {
      id: nextPlacementId(state, 'border'),
      kind: 'border',
      zone: 'hem',
      motif: motif.slug,
      run: args.run,
      hemOffsetMm: zone.hemOffsetMm ?? zone.heightMm / 2,
      threads: motif.threadCodes,
    };
    return appendPlacement(state, settleBorder(setting, state.sizeId, border));
  },
};
