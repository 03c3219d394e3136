import { findPlacement, isItem } from '../model/designer-state.ts';
import { withSettled } from '../model/settle.ts';
import type { EditCommand } from './command.ts';

export interface RotateArgs {
  /** The placement to turn; the selected one when left out. */
  id?: string;
  /** Turn to this angle, degrees clockwise. */
  toDeg?: number;
  /** Or turn by this much from where it is. */
  byDeg?: number;
}

/** The R key turns by this much: enough to see, and 24 presses go once round. */
export const ROTATE_STEP_DEG = 15;

/** Angles are kept from -180 to 180 degrees, whole, so "turned a quarter left" reads as -90 and not 270. */
const normalised = (deg: number) => {
  const whole = Math.round(deg) % 360;
  return whole > 180 ? whole - 360 : whole <= -180 ? whole + 360 : whole;
};

/** Turns a name, motif or artwork; a border follows the hem and does not turn. It stays inside its zone. */
export const rotatePlacement: EditCommand<RotateArgs, 'rotate-placement'> = {
  id: 'rotate-placement',
  label: 'Turn',
  isRecorded: true,
  shortcuts: [
    { key: 'r', args: { byDeg: ROTATE_STEP_DEG } },
    { key: 'r', withShift: true, args: { byDeg: -ROTATE_STEP_DEG } },
  ],
  mergeKey: (args, state) => `rotate-placement:${args.id ?? state.selectedId}`,
  perform(state, args, setting) {
    const placement = findPlacement(state, args.id ?? state.selectedId);
    if (!placement || !isItem(placement)) return state;
    const rotationDeg = normalised(args.toDeg ?? placement.rotationDeg + (args.byDeg ?? 0));
    if (rotationDeg === placement.rotationDeg) return state;
    return withSettled(setting, state, { ...placement, rotationDeg });
  },
};
