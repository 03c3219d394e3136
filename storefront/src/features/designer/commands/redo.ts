import { redo as redoStep } from '../model/history.ts';
import type { HistoryCommand } from './command.ts';

export const redo: HistoryCommand<'redo'> = {
  id: 'redo',
  label: 'Redo',
  // Shift+Ctrl/Cmd+Z everywhere, and Ctrl+Y as Windows programs have taught many people.
  shortcuts: [
    { key: 'z', withModifier: true, withShift: true, args: undefined },
    { key: 'y', withModifier: true, args: undefined },
  ],
  step: redoStep,
};
