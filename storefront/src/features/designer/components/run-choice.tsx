import type { BorderPlacement } from '@server/contracts/designs.ts';
import { formatLength } from '@ui/format.ts';

type Run = BorderPlacement['run'];

/** Front panel only, or the whole way round the hem, with each run's length at this size. */
export function RunChoice({
  name,
  value,
  frontMm,
  circumferenceMm,
  onChange,
}: {
  name: string;
  value: Run;
  frontMm: number;
  circumferenceMm: number;
  onChange: (run: Run) => void;
}) {
  const runs: [Run, string, number][] = [
    ['circumference', 'All the way round', circumferenceMm],
    ['front', 'Front only', frontMm],
  ];
  return (
    <fieldset>
      <legend className="text-sm font-medium">Along the hem</legend>
      <div className="mt-2 grid grid-cols-2 gap-2">
        {runs.map(([run, label, lengthMm]) => (
          <label key={run} className="cursor-pointer">
            <input
              type="radio"
              name={name}
              value={run}
              checked={run === value}
              onChange={() => onChange(run)}
              className="peer sr-only"
            />
            <span className="flex min-h-11 flex-col justify-center rounded-lg border border-linen-300 bg-white px-3 py-2 text-sm peer-checked:border-madder-500 peer-checked:bg-madder-50 peer-focus-visible:outline-3 peer-focus-visible:outline-saffron-500">
              <span className="font-medium">{label}</span>
              <span className="text-xs text-walnut-500">{formatLength(lengthMm)}</span>
            </span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
