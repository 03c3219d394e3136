import { movePlacement } from '../model/settle.ts';
import { snapToCentreLine } from '../model/snap.ts';
import type { EditCommand } from './command.ts';

export interface PlacementTarget {
  id: string;
  /** Where the pointer has carried the placement's centre, mm on the mockup. */
  centerXMm: number;
  centerYMm: number;
}

/**
 * Follows the pointer during a drag, kept inside the zone and snapping to its centre line; it previews only, and
 * move-placement ends the drag.
 */
export const dragPlacement: EditCommand<PlacementTarget, 'drag-placement'> = {
  id: 'drag-placement',
  label: 'Drag',
  isRecorded: false,
  perform: (state, { id, ...to }, setting) =>
    movePlacement(setting, state, id, snapToCentreLine(setting, state, id, to)),
};
