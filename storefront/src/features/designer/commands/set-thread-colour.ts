import { findPlacement, replacePlacement } from '../model/designer-state.ts';
import type { EditCommand } from './command.ts';

export interface SetThreadColourArgs {
  id: string;
  /** Which colour of a motif or border, in stitching order from 0; lettering has one, 0. */
  index: number;
  /** A thread code from the shop's palette. */
  thread: string;
}

/** Chooses the thread for one colour of a motif or border, or for a name; the canvas recolours from the document. */
export const setThreadColour: EditCommand<SetThreadColourArgs, 'set-thread-colour'> = {
  id: 'set-thread-colour',
  label: 'Choose the thread',
  isRecorded: true,
  perform(state, { id, index, thread }) {
    const placement = findPlacement(state, id);
    if (!placement || placement.kind === 'artwork') return state;
    if (placement.kind === 'lettering')
      return index !== 0 || placement.thread === thread ? state : replacePlacement(state, { ...placement, thread });
    if (
      !Number.isInteger(index) ||
      index < 0 ||
      index >= placement.threads.length ||
      placement.threads[index] === thread
    )
      return state;
    return replacePlacement(state, {
      ...placement,
      threads: placement.threads.map((code, at) => (at === index ? thread : code)),
    });
  },
};
