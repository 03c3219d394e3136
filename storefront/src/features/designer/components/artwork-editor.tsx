import type { ArtworkPlacement } from '@server/contracts/designs.ts';
import type { Dispatch } from '../commands/command-registry.ts';
import { artworkWidthRange } from '../model/artwork-rules.ts';
import { artworkOf, sizeOf, zoneOf, type DesignSetting } from '../model/design-setting.ts';
import type { DesignerState } from '../model/designer-state.ts';
import { largestHoop } from '../model/hoop-limit.ts';
import { itemExtent, uprightExtent } from '../model/item-extent.ts';
import { fitsZone } from '../model/clamp.ts';
import { ArtworkWidthField } from './artwork-width-field.tsx';
import { ZoneChoice } from './zone-choice.tsx';
import { TooBigNote } from './too-big-note.tsx';

export function ArtworkEditor({
  placement,
  setting,
  state,
  dispatch,
}: {
  placement: ArtworkPlacement;
  setting: DesignSetting;
  state: DesignerState;
  dispatch: Dispatch;
}) {
  const artwork = artworkOf(setting, placement.artworkUploadId);
  const size = sizeOf(setting, state.sizeId);
  const zone = zoneOf(size, placement.zone);
  const range = artworkWidthRange(setting, artwork, zone);
  const hoop = largestHoop(setting.hoops);
  const limitNote =
    range.limitedBy === 'zone' && zone
      ? `It can be no bigger than the space for it (“${zone.label}”).`
      : range.limitedBy === 'hoop' && hoop
        ? `Any bigger would not fit our largest hoop's ${hoop.fieldWidthMm} × ${hoop.fieldHeightMm} mm sewing field (the area the machine reaches in one go) with ${hoop.clearanceMm} mm kept clear at each edge.`
        : '';
  return (
    <div className="space-y-4">
      {artwork ? (
        <p className="text-sm text-walnut-700">
          {artwork.originalName}
          {artwork.kind === 'raster'
            ? ': a photo or scan. The studio turns it into stitches by hand (digitizing) and confirms the price before anything is made.'
            : ': a drawing, so we can count its stitches straight away.'}
        </p>
      ) : (
        <p className="text-sm text-walnut-700">
          This artwork was uploaded in another browser or account; sign in to the account that uploaded it to see it.
        </p>
      )}
      {zone && !fitsZone(itemExtent(setting, placement), zone) && (
        <TooBigNote zone={zone} advice="Try it narrower, turned less, or in another place." />
      )}
      <ArtworkWidthField
        value={placement.widthMm}
        heightMm={uprightExtent(setting, placement).heightMm}
        range={range}
        limitNote={limitNote}
        onChange={(widthMm) => dispatch('update-artwork', { id: placement.id, widthMm })}
      />
      <ZoneChoice
        zones={size.zones}
        value={placement.zone}
        onChange={(code) => dispatch('update-artwork', { id: placement.id, zone: code })}
      />
    </div>
  );
}
