import type { BorderPlacement } from '@server/contracts/designs.ts';
import { findPlacement } from '../model/designer-state.ts';
import { motifOf } from '../model/design-setting.ts';
import { withSettled } from '../model/settle.ts';
import type { EditCommand } from './command.ts';

export interface UpdateBorderArgs {
  id: string;
  motif?: string;
  run?: BorderPlacement['run'];
}

/**
 * Changes a border's motif or run. The repeat count, size and hoop a saved document recorded belong to the old
 * layout, so they are dropped and the engine fits the new one afresh.
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
    if (motif.slug === border.motif && run === border.run) return state;
    const { count, scalePct, hoop, ...kept } = border;
    const threads = motif.slug === border.motif ? border.threads : motif.threadCodes;
    return withSettled(setting, state, { ...kept, motif: motif.slug, run, threads });
  },
};
