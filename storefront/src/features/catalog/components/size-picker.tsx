import type { GarmentSummary } from '@server/contracts/catalog.ts';

type Size = GarmentSummary['sizes'][number];

/** Large, thumb-sized size chips; arrow keys move between them as in any radio group. */
export function SizePicker({ sizes, selectedId, onSelect }: { sizes: Size[]; selectedId: number | undefined; onSelect: (id: number) => void }) {
  return (
    <fieldset>
      <legend className="font-medium">Size</legend>
      <div className="mt-2 flex flex-wrap gap-2">
        {sizes.map((size) => (
          <label key={size.id} className="cursor-pointer">
            <input
              type="radio"
              name="size"
              value={size.id}
              checked={size.id === selectedId}
              onChange={() => onSelect(size.id)}
              className="peer sr-only"
            />
            <span className="inline-flex min-h-11 items-center rounded-full border border-linen-300 bg-white px-4 text-sm peer-checked:border-madder-500 peer-checked:bg-madder-50 peer-checked:font-semibold peer-checked:text-madder-700 peer-focus-visible:outline-3 peer-focus-visible:outline-saffron-500">
              {size.label}
            </span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
