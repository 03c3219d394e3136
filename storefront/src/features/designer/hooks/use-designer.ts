import { useCallback, useEffect, useRef, useState, type KeyboardEvent } from 'react';
import { commandForKey, runCommand, type CommandArgs, type CommandId } from '../commands/command-registry.ts';
import type { DesignSetting } from '../model/design-setting.ts';
import type { DesignerState } from '../model/designer-state.ts';
import { canRedo, canUndo, startHistory } from '../model/history.ts';

/** Keys typed into a field belong to the field: Delete edits the text there, and Ctrl+Z undoes typing. */
const isTypingTarget = (target: EventTarget) =>
  target instanceof HTMLElement &&
  (target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName));

/**
 * The designer's state and undo history, changed only by dispatching commands by id; the keyboard shortcuts are
 * read from the commands themselves. `initial` is read once, when the designer opens.
 */
export function useDesigner(setting: DesignSetting, initial: DesignerState) {
  const [history, setHistory] = useState(() => startHistory(initial));
  const latest = useRef({ history, setting });
  useEffect(() => {
    latest.current = { history, setting };
  });

  const dispatch = useCallback(<K extends CommandId>(id: K, args: CommandArgs<K>) => {
    setHistory((current) => runCommand(current, id, args, latest.current.setting));
  }, []);

  const onKeyDown = useCallback(
    (event: KeyboardEvent) => {
      if (isTypingTarget(event.target)) return;
      const found = commandForKey(event);
      if (!found) return;
      // A key that changes nothing (an arrow with nothing selected) keeps its usual job, such as scrolling.
      const { history: current, setting: now } = latest.current;
      if (runCommand(current, found.id, found.args as never, now) === current) return;
      event.preventDefault();
      dispatch(found.id, found.args as never);
    },
    [dispatch],
  );

  return { state: history.present, canUndo: canUndo(history), canRedo: canRedo(history), dispatch, onKeyDown };
}

export type Designer = ReturnType<typeof useDesigner>;
