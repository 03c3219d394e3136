import { useId } from 'react';
import type { PlacementZoneSummary } from '@server/contracts/catalogue.ts';

/** Where on the garment an item goes, when the garment has more than one place for it. */
export function ZoneChoice({
  zones,
  value,
  onChange,
}: {
  zones: readonly PlacementZoneSummary[];
  value: string;
  onChange: (code: string) => void;
}) {
  const id = useId();
  if (zones.length < 2) return null;
  return (
    <div>
      <label htmlFor={id} className="text-sm font-medium">
        Place on the garment
      </label>
      <select
        id={id}
        value={value}
        onChange={(event) => onChange(event.target.value)}
        className="mt-2 block min-h-11 w-full rounded-lg border border-linen-300 bg-white px-3"
      >
        {zones.map((zone) => (
          <option key={zone.code} value={zone.code}>
            {zone.label}
          </option>
        ))}
      </select>
    </div>
  );
}
