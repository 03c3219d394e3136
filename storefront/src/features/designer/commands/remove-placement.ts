import { findPlacement } from '../model/designer-state.ts';
import type { EditCommand } from './command.ts';

export interface RemoveArgs {
  /** The placement to remove; the selected one when left out. */
  id?: string;
}

export const removePlacement: EditCommand<RemoveArgs, 'remove-placement'> = {
  id: 'remove-placement',
  label: 'Remove',
  isRecorded: true,
  shortcuts: [
    { key: 'Delete', args: {} },
    { key: 'Backspace', args: {} },
  ],
  perform(state, args) {
    const placement = findPlacement(state, args.id ?? state.selectedId);
    if (!placement) return state;
    const placements = state.document.placements.filter((candidate) => candidate !== placement);
    const selectedId = state.selectedId === placement.id ? null : state.selectedId;
    return { ...state, document: { ...state.document, placements }, selectedId };
  },
};
