import { findPlacement } from '../model/designer-state.ts';
import { motifOf, sizeOf, zoneOf } from '../model/design-setting.ts';
import { clampMotifScale } from '../model/motif-rules.ts';
import { placeFreely } from '../model/placement-outlines.ts';
import { withSettled } from '../model/settle.ts';
import type { EditCommand } from './command.ts';

export interface UpdateMotifArgs {
  id: string;
  scalePct?: number;
  /** Moving to another zone starts from that zone's middle. */
  zone?: string;
}

/** Resizes a single motif within its limits or moves it to another zone, keeping it inside the zone. */
export const updateMotif: EditCommand<UpdateMotifArgs, 'update-motif'> = {
  id: 'update-motif',
  label: 'Change the motif',
  isRecorded: true,
  // Sliding the size is one change to undo, not one per step.
  mergeKey: (args) => `update-motif:${args.id}:${Object.keys(args).sort().join(',')}`,
  perform(state, args, setting) {
    const placement = findPlacement(state, args.id);
    if (placement?.kind !== 'motif') return state;
    const motif = motifOf(setting, placement.motif);
    if (!motif) return state;
    const scalePct =
      args.scalePct === undefined ? placement.scalePct : clampMotifScale(motif, args.scalePct, setting.hoops);
    const zone =
      args.zone === undefined || args.zone === placement.zone
        ? undefined
        : zoneOf(sizeOf(setting, state.sizeId), args.zone);
    if (!zone && scalePct === placement.scalePct) return state;
    const next = { ...placement, scalePct };
    return withSettled(setting, state, zone ? placeFreely(setting, state, zone, next) : next);
  },
};
