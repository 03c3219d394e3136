import type { ReactNode } from 'react';
import type { StudioHoop } from '@server/contracts/admin-catalogue.ts';
import { formatLength } from '@ui/format.ts';

/** Each hoop's sewing field drawn to one common scale, so their sizes compare at a glance. */
export function HoopFields({
  hoops,
  renderActions,
}: {
  hoops: StudioHoop[];
  renderActions?: (hoop: StudioHoop) => ReactNode;
}) {
  const largestMm = Math.max(1, ...hoops.flatMap((h) => [h.fieldWidthMm, h.fieldHeightMm]));
  const pxPerMm = 140 / largestMm;
  return (
    <ul className="flex flex-wrap items-end gap-6">
      {hoops.map((hoop) => (
        <li key={hoop.id} className={`text-center text-sm ${hoop.isActive ? '' : 'opacity-60'}`}>
          <div
            className="mx-auto rounded-md border-2 border-dashed border-walnut-500 bg-linen-100"
            style={{ width: hoop.fieldWidthMm * pxPerMm, height: hoop.fieldHeightMm * pxPerMm }}
            aria-hidden="true"
          />
          <p className="mt-2 font-medium">
            {hoop.name}
            {hoop.isActive ? '' : ' (retired)'}
          </p>
          <p className="text-xs text-walnut-500">
            {formatLength(hoop.fieldWidthMm)} × {formatLength(hoop.fieldHeightMm)}
          </p>
          <p className="text-xs text-walnut-500">{hoop.clearanceMm} mm kept clear at each edge</p>
          {renderActions && <div className="mt-2 flex flex-wrap justify-center gap-2">{renderActions(hoop)}</div>}
        </li>
      ))}
    </ul>
  );
}
