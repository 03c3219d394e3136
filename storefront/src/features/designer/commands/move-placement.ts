import { movePlacement as moveWithinZone } from '../model/settle.ts';
import { snapToCentreLine } from '../model/snap.ts';
import type { EditCommand } from './command.ts';
import type { PlacementTarget } from './drag-placement.ts';

/** Puts a placement where a drag ended (snapping as the drag did): one undo entry for the whole drag. */
export const movePlacement: EditCommand<PlacementTarget, 'move-placement'> = {
  id: 'move-placement',
  label: 'Move',
  isRecorded: true,
  perform: (state, { id, ...to }, setting) =>
    moveWithinZone(setting, state, id, snapToCentreLine(setting, state, id, to)),
};
