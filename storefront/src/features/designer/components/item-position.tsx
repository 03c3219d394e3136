import type { DesignSetting } from '../model/design-setting.ts';
import type { DesignerState, ItemPlacement } from '../model/designer-state.ts';
import { offsetFromZoneMiddle } from '../model/item-offset.ts';

function along(offsetMm: number, [before, after, centred]: [string, string, string]) {
  const rounded = Math.round(Math.abs(offsetMm));
  return rounded === 0 ? centred : `${rounded} mm ${offsetMm < 0 ? before : after} centre`;
}

/** Where an item sits in its zone, in words, announced as it moves, for those moving it by buttons or keys. */
export function ItemPosition({
  setting,
  state,
  item,
}: {
  setting: DesignSetting;
  state: DesignerState;
  item: ItemPlacement;
}) {
  const offset = offsetFromZoneMiddle(setting, state.sizeId, item);
  if (!offset) return null;
  const across = along(offset.dxMm, ['left of', 'right of', 'centred side to side']);
  const down = along(offset.dyMm, ['above', 'below', 'centred top to bottom']);
  return (
    <p role="status" className="text-sm text-walnut-700">
      In “{offset.zone.label}”: {across}, {down}.
    </p>
  );
}
