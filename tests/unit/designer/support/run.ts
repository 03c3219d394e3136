import {
  commandForKey,
  runCommand,
  type CommandArgs,
  type CommandId,
} from '../../../../storefront/src/features/designer/commands/command-registry.ts';
import { createDesignerState } from '../../../../storefront/src/features/designer/model/designer-state.ts';
import { startHistory, type DesignerHistory } from '../../../../storefront/src/features/designer/model/history.ts';
import { setting } from './bishop-dress-setting.ts';

/** A fresh history for the 6-month bishop dress in Christening White. */
export const freshHistory = (): DesignerHistory => startHistory(createDesignerState(301, 301));

export const run = <K extends CommandId>(history: DesignerHistory, id: K, args: CommandArgs<K>) =>
  runCommand(history, id, args, setting);

/** Runs whatever a key press stands for, as the designer's keyboard handler does. */
export function press(
  history: DesignerHistory,
  key: string,
  modifiers: { shift?: boolean; ctrl?: boolean } = {},
): DesignerHistory {
  const found = commandForKey({
    key,
    shiftKey: Boolean(modifiers.shift),
    ctrlKey: Boolean(modifiers.ctrl),
    metaKey: false,
  });
  if (!found) throw new Error(`No command for ${key}`);
  return runCommand(history, found.id, found.args as never, setting);
}

export const placementsOf = (history: DesignerHistory) => history.present.document.placements;
export const only = (history: DesignerHistory, id: string) => {
  const placement = placementsOf(history).find((candidate) => candidate.id === id);
  if (!placement) throw new Error(`No placement ${id}`);
  return placement;
};
