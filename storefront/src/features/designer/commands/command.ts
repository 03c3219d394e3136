import type { DesignerState } from '../model/designer-state.ts';
import type { DesignSetting } from '../model/design-setting.ts';
import type { DesignerHistory } from '../model/history.ts';

/** A key that runs a command with fixed arguments. */
export interface Shortcut<A> {
  /** KeyboardEvent.key, compared without regard to case. */
  key: string;
  /** Ctrl, or Cmd on a Mac. */
  withModifier?: boolean;
  withShift?: boolean;
  args: A;
}

/**
 * A change to the design: a pure function of the state, its arguments and the setting. It returns the same state
 * object when there is nothing to do. `isRecorded` says whether it makes an undo entry (a drag's pointer moves do
 * not; the pointer-up does), and `mergeKey` lets repeats of one edit share an entry.
 */
export interface EditCommand<A, Id extends string = string> {
  id: Id;
  label: string;
  shortcuts?: readonly Shortcut<A>[];
  isRecorded: boolean;
  perform: (state: DesignerState, args: A, setting: DesignSetting) => DesignerState;
  mergeKey?: (args: A, state: DesignerState) => string;
}

/** Undo and redo step through the history rather than change the design. */
export interface HistoryCommand<Id extends string = string> {
  id: Id;
  label: string;
  shortcuts: readonly Shortcut<undefined>[];
  step: (history: DesignerHistory) => DesignerHistory;
}

export interface KeyPress {
  key: string;
  ctrlKey: boolean;
  metaKey: boolean;
  shiftKey: boolean;
}

export const matchesShortcut = (shortcut: Shortcut<unknown>, press: KeyPress) =>
  press.key.toLowerCase() === shortcut.key.toLowerCase() &&
  (press.ctrlKey || press.metaKey) === Boolean(shortcut.withModifier) &&
  press.shiftKey === Boolean(shortcut.withShift);
