import type { GarmentSummary } from '@server/contracts/catalogue.ts';

type FabricColour = GarmentSummary['colours'][number];

/** Thumb-sized swatches of the garment's fabric colours; the chosen one is pressed. */
export function FabricColourPicker({
  colours,
  selected,
  onSelect,
}: {
  colours: FabricColour[];
  selected: FabricColour | undefined;
  onSelect: (id: number) => void;
}) {
  return (
    <fieldset>
      <legend className="font-medium">Fabric colour{selected ? `: ${selected.name}` : ''}</legend>
      <div className="mt-2 flex flex-wrap gap-2">
        {colours.map((colour) => (
          <button
            key={colour.id}
            type="button"
            aria-pressed={colour.id === selected?.id}
            aria-label={colour.name}
            onClick={() => onSelect(colour.id)}
            className="h-11 w-11 rounded-full border-2 border-white shadow ring-2 ring-linen-300 aria-pressed:ring-madder-500"
            style={{ backgroundColor: colour.hex }}
          />
        ))}
      </div>
    </fieldset>
  );
}
