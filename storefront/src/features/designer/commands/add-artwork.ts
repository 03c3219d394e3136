import type { ArtworkPlacement } from '@server/contracts/designs.ts';
import { appendPlacement, hasRoomForPlacement, nextPlacementId } from '../model/designer-state.ts';
import { artworkOf, defaultItemZone, sizeOf, zoneOf } from '../model/design-setting.ts';
import { artworkWidthRange, clampArtworkWidth, STARTING_WIDTH_MM } from '../model/artwork-rules.ts';
import { placeFreely } from '../model/placement-outlines.ts';
import { centreOfZone, settleItem } from '../model/settle.ts';
import type { EditCommand } from './command.ts';

export interface AddArtworkArgs {
  /** One of the customer's own uploads. */
  artworkUploadId: number;
  /** The zone to centre it in; the garment's first zone for items when left out. */
  zone?: string;
}

/** Puts the customer's own artwork in the largest free part of a zone, as wide as reads well and no wider than fits. */
export const addArtwork: EditCommand<AddArtworkArgs, 'add-artwork'> = {
  id: 'add-artwork',
  label: 'Put it on the garment',
  isRecorded: true,
  perform(state, args, setting) {
    const artwork = artworkOf(setting, args.artworkUploadId);
    const size = sizeOf(setting, state.sizeId);
    const zone = (args.zone === undefined ? undefined : zoneOf(size, args.zone)) ?? defaultItemZone(size);
    if (!artwork || !zone || !hasRoomForPlacement(state)) return state;
    const placement: ArtworkPlacement = {
      id: nextPlacementId(state, 'artwork'),
      kind: 'artwork',
      zone: zone.code,
      ...centreOfZone(zone),
      rotationDeg: 0,
      artworkUploadId: artwork.id,
      widthMm: clampArtworkWidth(artworkWidthRange(setting, artwork, zone), STARTING_WIDTH_MM),
    };
    return appendPlacement(state, settleItem(setting, state.sizeId, placeFreely(setting, state, zone, placement)));
  },
};
