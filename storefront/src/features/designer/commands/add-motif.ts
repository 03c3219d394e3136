import type { MotifPlacement } from '@server/contracts/designs.ts';
import { appendPlacement, hasRoomForPlacement, nextPlacementId } from '../model/designer-state.ts';
import { defaultItemZone, motifOf, sizeOf, zoneOf } from '../model/design-setting.ts';
import { clampMotifScale } from '../model/motif-rules.ts';
import { placeFreely } from '../model/placement-outlines.ts';
import { centreOfZone, settleItem } from '../model/settle.ts';
import type { EditCommand } from './command.ts';

export interface AddMotifArgs {
  motif: string;
  scalePct: number;
  /** The zone to centre it in; the garment's first zone for items when left out. */
  zone?: string;
}

/** Adds a single motif in the largest free part of a zone, in the motif's own threads. */
export const addMotif: EditCommand<AddMotifArgs, 'add-motif'> = {
  id: 'add-motif',
  label: 'Add this motif',
  isRecorded: true,
  perform(state, args, setting) {
    const motif = motifOf(setting, args.motif);
    const size = sizeOf(setting, state.sizeId);
    const zone = (args.zone === undefined ? undefined : zoneOf(size, args.zone)) ?? defaultItemZone(size);
    if (!motif || motif.kind !== 'single' || !zone || !hasRoomForPlacement(state)) return state;
    const placement: MotifPlacement = {
      id: nextPlacementId(state, 'motif'),
      kind: 'motif',
      zone: zone.code,
      ...centreOfZone(zone),
      rotationDeg: 0,
      motif: motif.slug,
      scalePct: clampMotifScale(motif, args.scalePct, setting.hoops),
      threads: motif.threadCodes,
    };
    return appendPlacement(state, settleItem(setting, state.sizeId, placeFreely(setting, state, zone, placement)));
  },
};
