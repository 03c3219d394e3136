import type { ThreadColourSummary } from '@server/contracts/catalogue.ts';

/** The studio's thread palette as thumb-sized swatches in a radio group (arrow keys move between them). */
export function ThreadChoice({
  name,
  legend = 'Thread colour',
  threads,
  value,
  onChange,
}: {
  name: string;
  legend?: string;
  threads: readonly ThreadColourSummary[];
  value: string;
  onChange: (code: string) => void;
}) {
  const chosen = threads.find((thread) => thread.code === value);
  return (
    <fieldset>
      <legend className="text-sm font-medium">
        {legend}
        {chosen ? `: ${chosen.name}` : ''}
      </legend>
      <div className="mt-2 flex flex-wrap gap-1.5">
        {threads.map((thread) => (
          <label key={thread.code} className="cursor-pointer" title={thread.name}>
            <input
              type="radio"
              name={name}
              value={thread.code}
              checked={thread.code === value}
              onChange={() => onChange(thread.code)}
              className="peer sr-only"
              aria-label={thread.name}
            />
            <span
              className="block h-11 w-11 rounded-full border-2 border-white shadow-sm ring-1 ring-walnut-900/15 peer-checked:ring-3 peer-checked:ring-madder-500 peer-focus-visible:outline-3 peer-focus-visible:outline-saffron-500"
              style={{ backgroundColor: thread.hex }}
            />
          </label>
        ))}
      </div>
    </fieldset>
  );
}
