import { findPlacement } from '../model/designer-state.ts';
import { artworkOf, sizeOf, zoneOf } from '../model/design-setting.ts';
import { artworkWidthRange, clampArtworkWidth } from '../model/artwork-rules.ts';
import { placeFreely } from '../model/placement-outlines.ts';
import { withSettled } from '../model/settle.ts';
import type { EditCommand } from './command.ts';

export interface UpdateArtworkArgs {
  id: string;
  widthMm?: number;
  /** Moving to another zone starts from that zone's middle. */
  zone?: string;
}

/** Resizes the customer's artwork by its width (its height follows) within its zone and the largest hoop, or moves it. */
export const updateArtwork: EditCommand<UpdateArtworkArgs, 'update-artwork'> = {
  id: 'update-artwork',
  label: 'Change the artwork',
  isRecorded: true,
  // Sliding the width is one change to undo, not one per step.
  mergeKey: (args) => `update-artwork:${args.id}:${Object.keys(args).sort().join(',')}`,
  perform(state, args, setting) {
    const placement = findPlacement(state, args.id);
    if (placement?.kind !== 'artwork') return state;
    const size = sizeOf(setting, state.sizeId);
    const zone = args.zone === undefined || args.zone === placement.zone ? undefined : zoneOf(size, args.zone);
    const range = artworkWidthRange(
      setting,
      artworkOf(setting, placement.artworkUploadId),
      zone ?? zoneOf(size, placement.zone),
    );
    const widthMm = clampArtworkWidth(range, args.widthMm ?? placement.widthMm);
    if (!zone && widthMm === placement.widthMm) return state;
    const next = { ...placement, widthMm };
    return withSettled(setting, state, zone ? placeFreely(setting, state, zone, next) : next);
  },
};
