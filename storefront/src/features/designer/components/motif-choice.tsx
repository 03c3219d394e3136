import type { ReactNode } from 'react';
import type { MotifSummary } from '@server/contracts/catalogue.ts';
import { svgDataUrl } from '@ui/svg-data-url.ts';

const pictureOf = (motif: MotifSummary) => svgDataUrl(motif.svg);

/** Catalogue motifs as picture cards in a radio group; `detailOf` adds a line under each name. */
export function MotifChoice({
  name,
  legend,
  motifs,
  value,
  onChange,
  detailOf,
}: {
  name: string;
  legend: string;
  motifs: readonly MotifSummary[];
  value: string;
  onChange: (slug: string) => void;
  detailOf: (motif: MotifSummary) => ReactNode;
}) {
  return (
    <fieldset>
      <legend className="text-sm font-medium">{legend}</legend>
      <div className="mt-2 grid gap-2">
        {motifs.map((motif) => (
          <label key={motif.slug} className="cursor-pointer">
            <input
              type="radio"
              name={name}
              value={motif.slug}
              checked={motif.slug === value}
              onChange={() => onChange(motif.slug)}
              className="peer sr-only"
            />
            <span className="flex items-center gap-3 rounded-lg border border-linen-300 bg-white p-2 peer-checked:border-madder-500 peer-checked:bg-madder-50 peer-focus-visible:outline-3 peer-focus-visible:outline-saffron-500">
              <span className="flex h-12 w-20 shrink-0 items-center justify-center rounded-md bg-linen-100 p-1">
                <img src={pictureOf(motif)} alt="" className="max-h-full max-w-full" />
              </span>
              <span className="min-w-0">
                <span className="block font-medium">{motif.name}</span>
                <span className="block text-xs text-walnut-500">{detailOf(motif)}</span>
              </span>
            </span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
