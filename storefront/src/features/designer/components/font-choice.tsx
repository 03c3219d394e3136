import type { LetteringFontSummary } from '@server/contracts/catalogue.ts';

/** The lettering fonts, each shown in its own face with the customer's own words. */
export function FontChoice({
  name,
  fonts,
  value,
  sample,
  onChange,
}: {
  name: string;
  fonts: readonly LetteringFontSummary[];
  value: string;
  sample: string;
  onChange: (slug: string) => void;
}) {
  return (
    <fieldset>
      <legend className="text-sm font-medium">Lettering style</legend>
      <div className="mt-2 grid grid-cols-2 gap-2">
        {fonts.map((font) => (
          <label key={font.slug} className="cursor-pointer">
            <input
              type="radio"
              name={name}
              value={font.slug}
              checked={font.slug === value}
              onChange={() => onChange(font.slug)}
              className="peer sr-only"
            />
            <span className="flex min-h-16 flex-col justify-center rounded-lg border border-linen-300 bg-white px-3 py-2 peer-checked:border-madder-500 peer-checked:bg-madder-50 peer-focus-visible:outline-3 peer-focus-visible:outline-saffron-500">
              <span
                className="truncate text-2xl leading-tight text-walnut-900"
                style={{ fontFamily: `"${font.fontFamily}", cursive` }}
                aria-hidden="true"
              >
                {sample.trim() || 'Eliza'}
              </span>
              <span className="text-xs text-walnut-500">{font.name}</span>
            </span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
