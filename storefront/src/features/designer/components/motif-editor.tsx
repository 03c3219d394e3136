import type { ThreadColourSummary } from '@server/contracts/catalogue.ts';
import type { MotifPlacement } from '@server/contracts/designs.ts';
import { fitsZone } from '../model/clamp.ts';
import { motifOf, sizeOf, zoneOf, type DesignSetting } from '../model/design-setting.ts';
import { itemExtent } from '../model/item-extent.ts';
import type { DesignerState } from '../model/designer-state.ts';
import type { Dispatch } from '../commands/command-registry.ts';
import { MotifSizeField } from './motif-size-field.tsx';
import { TooBigNote } from './too-big-note.tsx';
import { ZoneChoice } from './zone-choice.tsx';
import { PlacementThreads } from './placement-threads.tsx';

export function MotifEditor({
  placement,
  setting,
  state,
  threads,
  dispatch,
}: {
  placement: MotifPlacement;
  setting: DesignSetting;
  state: DesignerState;
  threads: readonly ThreadColourSummary[];
  dispatch: Dispatch;
}) {
  const motif = motifOf(setting, placement.motif);
  if (!motif)
    return <p className="text-sm text-madder-700">This motif is no longer offered; remove it or choose another.</p>;
  const size = sizeOf(setting, state.sizeId);
  const zone = zoneOf(size, placement.zone);
  return (
    <div className="space-y-4">
      {zone && !fitsZone(itemExtent(setting, placement), zone) && (
        <TooBigNote zone={zone} advice="Try it smaller, or in another place." />
      )}
      <MotifSizeField
        motif={motif}
        hoops={setting.hoops}
        value={placement.scalePct}
        onChange={(scalePct) => dispatch('update-motif', { id: placement.id, scalePct })}
      />
      <ZoneChoice
        zones={size.zones}
        value={placement.zone}
        onChange={(zone) => dispatch('update-motif', { id: placement.id, zone })}
      />
      <PlacementThreads placement={placement} threads={threads} dispatch={dispatch} />
    </div>
  );
}
