import { findPlacement } from '../model/designer-state.ts';
import type { EditCommand } from './command.ts';

export interface SelectArgs {
  /** Null lets go of the selection. */
  id: string | null;
}

/** Choosing what to work on is not a change to the design, so it makes no undo entry. */
export const selectPlacement: EditCommand<SelectArgs, 'select-placement'> = {
  id: 'select-placement',
  label: 'Select',
  isRecorded: false,
  shortcuts: [{ key: 'Escape', args: { id: null } }],
  perform(state, { id }) {
    if (id === state.selectedId || (id !== null && !findPlacement(state, id))) return state;
    return { ...state, selectedId: id };
  },
};
