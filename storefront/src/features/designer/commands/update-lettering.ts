import { findPlacement } from '../model/designer-state.ts';
import { fontOf, sizeOf, zoneOf } from '../model/design-setting.ts';
import { checkLetteringText, clampLetterHeight } from '../model/lettering-rules.ts';
import { placeFreely } from '../model/placement-outlines.ts';
import { withSettled } from '../model/settle.ts';
import type { EditCommand } from './command.ts';

export interface UpdateLetteringArgs {
  id: string;
  text?: string;
  font?: string;
  letterHeightMm?: number;
  /** Moving to another zone starts from that zone's middle. */
  zone?: string;
}

/**
 * Edits a name. Larger letters or a longer name may push it past its zone's edge, so it is settled back inside; a
 * new font keeps the height within what that font sews cleanly at.
 */
export const updateLettering: EditCommand<UpdateLetteringArgs, 'update-lettering'> = {
  id: 'update-lettering',
  label: 'Change the name',
  isRecorded: true,
  // Typing a name or sliding its height is one change to undo, not one per key or step.
  mergeKey: (args) => `update-lettering:${args.id}:${Object.keys(args).sort().join(',')}`,
  perform(state, args, setting) {
    const lettering = findPlacement(state, args.id);
    if (lettering?.kind !== 'lettering') return state;
    const font = fontOf(setting, args.font ?? lettering.font);
    if (!font || (args.text !== undefined && !checkLetteringText(args.text).ok)) return state;
    const zone =
      args.zone === undefined || args.zone === lettering.zone
        ? undefined
        : zoneOf(sizeOf(setting, state.sizeId), args.zone);
    const next = {
      ...lettering,
      text: args.text ?? lettering.text,
      font: font.slug,
      letterHeightMm: clampLetterHeight(font, args.letterHeightMm ?? lettering.letterHeightMm),
    };
    const isUnchanged =
      !zone &&
      next.text === lettering.text &&
      next.font === lettering.font &&
      next.letterHeightMm === lettering.letterHeightMm;
    if (isUnchanged) return state;
    return withSettled(setting, state, zone ? placeFreely(setting, state, zone, next) : next);
  },
};
