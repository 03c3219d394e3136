import type { LetteringPlacement } from '@server/contracts/designs.ts';
import { appendPlacement, hasRoomForPlacement, nextPlacementId } from '../model/designer-state.ts';
import { defaultItemZone, fontOf, sizeOf, zoneOf } from '../model/design-setting.ts';
import { checkLetteringText, clampLetterHeight } from '../model/lettering-rules.ts';
import { placeFreely } from '../model/placement-outlines.ts';
import { centreOfZone, settleItem } from '../model/settle.ts';
import type { EditCommand } from './command.ts';

export interface AddLetteringArgs {
  text: string;
  font: string;
  letterHeightMm: number;
  thread: string;
  /** The zone to centre it in; the garment's first zone for items when left out. */
  zone?: string;
}

/** Adds a name (or short words) in the largest free part of a zone; text the contract would refuse is not added. */
export const addLettering: EditCommand<AddLetteringArgs, 'add-lettering'> = {
  id: 'add-lettering',
  label: 'Add the name',
  isRecorded: true,
  perform(state, args, setting) {
    const font = fontOf(setting, args.font);
    const size = sizeOf(setting, state.sizeId);
    const zone = (args.zone === undefined ? undefined : zoneOf(size, args.zone)) ?? defaultItemZone(size);
    if (!font || !zone || !checkLetteringText(args.text).ok || !hasRoomForPlacement(state)) return state;
    const lettering: LetteringPlacement = {
      id: nextPlacementId(state, 'name'),
      kind: 'lettering',
      zone: zone.code,
      ...centreOfZone(zone),
      rotationDeg: 0,
      text: args.text,
      font: font.slug,
      letterHeightMm: clampLetterHeight(font, args.letterHeightMm),
      thread: args.thread,
    };
    return appendPlacement(state, settleItem(setting, state.sizeId, placeFreely(setting, state, zone, lettering)));
  },
};
