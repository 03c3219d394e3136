import type { DesignSetting } from '../model/design-setting.ts';
import { preview, record, type DesignerHistory } from '../model/history.ts';
import { addBorder } from './add-border.ts';
import { addLettering } from './add-lettering.ts';
import { addMotif } from './add-motif.ts';
import { addArtwork } from './add-artwork.ts';
import { updateArtwork } from './update-artwork.ts';
import { rotatePlacement } from './rotate-placement.ts';
import { centrePlacement } from './centre-placement.ts';
import { setThreadColour } from './set-thread-colour.ts';
import { changeSize } from './change-size.ts';
import { matchesShortcut, type EditCommand, type HistoryCommand, type KeyPress } from './command.ts';
import { dragPlacement } from './drag-placement.ts';
import { movePlacement } from './move-placement.ts';
import { nudgePlacement } from './nudge-placement.ts';
import { redo } from './redo.ts';
import { removePlacement } from './remove-placement.ts';
import { selectPlacement } from './select-placement.ts';
import { setFabricColour } from './set-fabric-colour.ts';
import { undo } from './undo.ts';
import { updateBorder } from './update-border.ts';
import { updateLettering } from './update-lettering.ts';
import { updateMotif } from './update-motif.ts';

/** Every command the designer has; the toolbar, the panels, the keyboard and the tests all run them by id. */
const commands = [
  addBorder,
  updateBorder,
  addLettering,
  updateLettering,
  addMotif,
  updateMotif,
  addArtwork,
  updateArtwork,
  rotatePlacement,
  centrePlacement,
  setThreadColour,
  dragPlacement,
  movePlacement,
  nudgePlacement,
  removePlacement,
  selectPlacement,
  changeSize,
  setFabricColour,
  undo,
  redo,
] as const;

type DesignerCommand = (typeof commands)[number];
export type CommandId = DesignerCommand['id'];
type CommandOf<K extends CommandId> = Extract<DesignerCommand, { id: K }>;
export type CommandArgs<K extends CommandId> = CommandOf<K> extends EditCommand<infer A, K> ? A : undefined;

/** How the UI runs a command: by id, with that command's arguments. */
export type Dispatch = <K extends CommandId>(id: K, args: CommandArgs<K>) => void;

const byId = new Map<string, DesignerCommand>(commands.map((command) => [command.id, command]));

export function commandOf<K extends CommandId>(id: K): CommandOf<K> {
  return byId.get(id) as CommandOf<K>;
}

/** Runs a command on the history: undo and redo step through it; edits make an entry or only preview. */
export function runCommand<K extends CommandId>(
  history: DesignerHistory,
  id: K,
  args: CommandArgs<K>,
  setting: DesignSetting,
): DesignerHistory {
  // The signature pairs each id with its own arguments; a lookup by id cannot carry that pairing, so it widens here.
  const command = byId.get(id) as EditCommand<unknown> | HistoryCommand;
  if ('step' in command) return command.step(history);
  const next = command.perform(history.present, args, setting);
  return command.isRecorded ? record(history, next, command.mergeKey?.(args, history.present)) : preview(history, next);
}

/** The command and arguments a key press stands for, if any. */
export function commandForKey(press: KeyPress): { id: CommandId; args: unknown } | undefined {
  for (const command of commands) {
    const shortcut = command.shortcuts?.find((candidate) => matchesShortcut(candidate, press));
    if (shortcut) return { id: command.id, args: shortcut.args };
  }
  return undefined;
}
