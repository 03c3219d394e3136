import type { GarmentSummary } from '@server/contracts/catalogue.ts';
import { ChoiceChip } from './choice-chip.tsx';

type Size = GarmentSummary['sizes'][number];

/** Large, thumb-sized size chips; arrow keys move between them as in any radio group. */
export function SizePicker({
  sizes,
  selectedId,
  onSelect,
}: {
  sizes: Size[];
  selectedId: number | undefined;
  onSelect: (id: number) => void;
}) {
  return (
    <fieldset>
      <legend className="font-medium">Size</legend>
      <div className="mt-2 flex flex-wrap gap-2">
        {sizes.map((size) => (
          <ChoiceChip
            key={size.id}
            name="size"
            value={size.id}
            checked={size.id === selectedId}
            onSelect={() => onSelect(size.id)}
          >
            {size.label}
          </ChoiceChip>
        ))}
      </div>
    </fieldset>
  );
}
