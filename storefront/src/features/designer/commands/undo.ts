import { undo as undoStep } from '../model/history.ts';
import type { HistoryCommand } from './command.ts';

export const undo: HistoryCommand<'undo'> = {
  id: 'undo',
  label: 'Undo',
  shortcuts: [{ key: 'z', withModifier: true, args: undefined }],
  step: undoStep,
};
