import { useId } from 'react';
import type { GarmentSummary } from '@server/contracts/catalogue.ts';
import type { CatalogueFilter, CatalogueKind } from '../model/catalogue-filter.ts';
import { ChoiceChip } from './choice-chip.tsx';

const kindChoices: { value: CatalogueKind | undefined; label: string }[] = [
  { value: undefined, label: 'Everything' },
  { value: 'border', label: 'Borders' },
  { value: 'single', label: 'Single motifs' },
  { value: 'lettering', label: 'Lettering' },
];

/** Narrows the embroidery to one garment and one kind; both choices live in the address. */
export function CatalogueFilters({
  garments,
  filter,
  onChange,
}: {
  garments: GarmentSummary[];
  filter: CatalogueFilter;
  onChange: (filter: CatalogueFilter) => void;
}) {
  const garmentId = useId();
  const kindName = useId();
  return (
    // eslint-disable-next-line hoopwright-forms/form-needs-use-form -- no fields of its own: each choice is the address's
    <form
      role="search"
      aria-label="Filter the embroidery"
      className="flex flex-col gap-4 rounded-card bg-linen-100 p-4 sm:flex-row sm:items-end sm:gap-6"
      onSubmit={(event) => event.preventDefault()}
    >
      <div className="flex flex-col gap-1.5">
        <label htmlFor={garmentId} className="text-sm font-medium">
          For the garment
        </label>
        <select
          id={garmentId}
          value={filter.garment ?? ''}
          onChange={(event) => onChange({ ...filter, garment: event.target.value || undefined })}
          className="min-h-11 rounded-lg border border-linen-300 bg-white px-3"
        >
          <option value="">Any garment</option>
          {garments.map((garment) => (
            <option key={garment.id} value={garment.slug}>
              {garment.name}
            </option>
          ))}
        </select>
      </div>
      <fieldset>
        <legend className="text-sm font-medium">Kind</legend>
        <div className="mt-1.5 flex flex-wrap gap-2">
          {kindChoices.map((choice) => (
            <ChoiceChip
              key={choice.label}
              name={kindName}
              checked={filter.kind === choice.value}
              onSelect={() => onChange({ ...filter, kind: choice.value })}
            >
              {choice.label}
            </ChoiceChip>
          ))}
        </div>
      </fieldset>
    </form>
  );
}
