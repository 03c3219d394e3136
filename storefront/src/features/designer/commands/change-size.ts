import { isItem } from '../model/designer-state.ts';
import { sizeOf, zoneOf } from '../model/design-setting.ts';
import { settlePlacement } from '../model/settle.ts';
import type { EditCommand } from './command.ts';

export interface ChangeSizeArgs {
  sizeId: number;
}

/**
 * Switches to another size of the garment. Zones grow and shrink with the size, so each item keeps its place
 * relative to its zone; a border is refitted to the new hem, dropping any count the old fit recorded.
 */
export const changeSize: EditCommand<ChangeSizeArgs, 'change-size'> = {
  id: 'change-size',
  label: 'Change the size',
  isRecorded: true,
  perform(state, { sizeId }, setting) {
    if (sizeId === state.sizeId || !setting.garment.sizes.some((size) => size.id === sizeId)) return state;
    const from = sizeOf(setting, state.sizeId);
    const to = sizeOf(setting, sizeId);
    const placements = state.document.placements.map((placement) => {
      if (placement.kind === 'border') {
        const { count, scalePct, hoop, ...refitted } = placement;
        return settlePlacement(setting, sizeId, refitted);
      }
      if (!isItem(placement)) return placement;
      const [old, next] = [zoneOf(from, placement.zone), zoneOf(to, placement.zone)];
      if (!old || !next) return settlePlacement(setting, sizeId, placement);
      const carried = {
        ...placement,
        centerXMm: next.xMm + ((placement.centerXMm - old.xMm) / old.widthMm) * next.widthMm,
        centerYMm: next.yMm + ((placement.centerYMm - old.yMm) / old.heightMm) * next.heightMm,
      };
      return settlePlacement(setting, sizeId, carried);
    });
    return { ...state, sizeId, document: { ...state.document, placements } };
  },
};
