import { findPlacement } from '../model/designer-state.ts';
import { centreOf, movePlacement } from '../model/settle.ts';
import type { EditCommand, Shortcut } from './command.ts';

export interface NudgeArgs {
  /** The placement to move; the selected one when left out. */
  id?: string;
  dxMm: number;
  dyMm: number;
}

/** Arrow keys move by 1 mm, with Shift by 10 mm: fine enough to line a name up by eye, quick enough to cross a yoke. */
const arrows: [key: string, dx: number, dy: number][] = [
  ['ArrowLeft', -1, 0],
  ['ArrowRight', 1, 0],
  ['ArrowUp', 0, -1],
  ['ArrowDown', 0, 1],
];
const shortcuts: Shortcut<NudgeArgs>[] = arrows.flatMap(([key, dx, dy]) => [
  { key, args: { dxMm: dx, dyMm: dy } },
  { key, withShift: true, args: { dxMm: dx * 10, dyMm: dy * 10 } },
]);

/** Moves a placement a few millimetres, kept inside its zone; a border moves only up or down. */
export const nudgePlacement: EditCommand<NudgeArgs, 'nudge-placement'> = {
  id: 'nudge-placement',
  label: 'Move',
  isRecorded: true,
  shortcuts,
  perform(state, args, setting) {
    const placement = findPlacement(state, args.id ?? state.selectedId);
    if (!placement) return state;
    const centre = centreOf(setting, state, placement);
    return movePlacement(setting, state, placement.id, {
      centerXMm: centre.centerXMm + args.dxMm,
      centerYMm: centre.centerYMm + args.dyMm,
    });
  },
};
