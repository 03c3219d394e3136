import type { BorderPlacement } from '@server/contracts/designs.ts';
import { findPlacement } from '../model/designer-state.ts';
import { motifOf } from '../model/design-setting.ts';
import { withSettled } from '../model/settle.ts';
import type { EditCommand } from './command.ts';

export interface UpdateBorderArgs {
  id: string;
  motif?: string;
  run?: BorderPlacement['run'];
  /** Ask for this many repeats; the engine fits them or says why they don't fit. */
  count?: number;
}

/**
 * Changes a border's motif or run, or asks for a number of repeats. A new motif or run drops the count, size and
 * hoop a saved document recorded, as they belong to the old layout, and the engine fits the new one afresh.
 */
export const updateBorder: EditCommand<UpdateBorderArgs, 'update-border'> = {
  id: 'update-border',
  label: 'Change the border',
  isRecorded: true,
  perform(state, args, setting) {
    const border = findPlacement(state, args.id);
    if (border?.kind !== 'border') return state;
    const motif = motifOf(setting, args.motif ?? border.motif);
    if (!motif || motif.kind !== 'border') return state;
    const run = args.run ?? border.run;
    if (motif.slug === border.motif && run === border.run) {
      if (args.count === undefined || args.count === border.count || !Number.isInteger(args.count) || args.count < 1)
        return state;
      const { scalePct, hoop, ...kept } = border;
      return withSettled(setting, state, { ...kept, count: args.count });
    }
    const { count, scalePct, hoop, ...kept } = border;
    const threads = motif.slug === border.motif ? border.threads : motif.threadCodes;
    return withSettled(setting, state, { ...kept, motif: motif.slug, run, threads });
  },
};
