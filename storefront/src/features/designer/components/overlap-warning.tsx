import type { PlacementOverlap } from '@server/engine/placement-overlap.ts';
import type { DesignPlacement } from '@server/contracts/designs.ts';
import type { DesignSetting } from '../model/design-setting.ts';
import { placementLabel } from '../model/placement-label.ts';

const OVERLAP_LOOK = 'rounded-lg border border-saffron-500/50 bg-saffron-100 p-3 text-sm';

/** The names of the placements one placement overlaps, in words. */
function partnersOf(
  setting: DesignSetting,
  placements: readonly DesignPlacement[],
  id: string,
  overlaps: readonly PlacementOverlap[],
) {
  const ids = overlaps.flatMap((o) => (o.firstId === id ? [o.secondId] : o.secondId === id ? [o.firstId] : []));
  return ids.flatMap((other) => {
    const placement = placements.find((candidate) => candidate.id === other);
    return placement ? [placementLabel(setting, placement)] : [];
  });
}

/** Under one placement in the list: what it overlaps, so the customer sees which two to pull apart. */
export function PlacementOverlapNote({
  setting,
  placements,
  id,
  overlaps,
}: {
  setting: DesignSetting;
  placements: readonly DesignPlacement[];
  id: string;
  overlaps: readonly PlacementOverlap[];
}) {
  const partners = partnersOf(setting, placements, id, overlaps);
  if (partners.length === 0) return null;
  return (
    <p className={`mx-2 mb-2 ${OVERLAP_LOOK}`}>
      <span className="font-medium">Overlaps {partners.join(' and ')}.</span> Stitched like this, one would be sewn on
      top of the other; move one of them apart.
    </p>
  );
}

/**
 * Beside the garment: a note, read out as it appears, while any two placements would be stitched over each other.
 * The region is always there (empty when all is clear) so a screen reader announces the change.
 */
export function OverlapWarning({
  setting,
  placements,
  overlaps,
}: {
  setting: DesignSetting;
  placements: readonly DesignPlacement[];
  overlaps: readonly PlacementOverlap[];
}) {
  const labelOf = (id: string) => {
    const placement = placements.find((candidate) => candidate.id === id);
    return placement ? placementLabel(setting, placement) : 'an item';
  };
  return (
    <div role="status" aria-label="Overlapping embroidery">
      {overlaps.length > 0 && (
        <div className={OVERLAP_LOOK}>
          <p className="font-medium">Some of your embroidery overlaps</p>
          <ul className="mt-1 list-disc pl-5">
            {overlaps.map((overlap) => (
              <li key={`${overlap.firstId}|${overlap.secondId}`}>
                {labelOf(overlap.firstId)} and {labelOf(overlap.secondId)} overlap by {Math.round(overlap.depthMm)} mm.
              </li>
            ))}
          </ul>
          <p className="mt-1 text-walnut-700">
            The studio would stitch one on top of the other. Drag one aside, or open it in the list to move it.
          </p>
        </div>
      )}
    </div>
  );
}
