import { useId, useState } from 'react';
import type { ThreadColourSummary } from '@server/contracts/catalogue.ts';
import { offerNearestThreads } from '../model/thread-match.ts';
import { ThreadChoice } from './thread-choice.tsx';

/**
 * One thread colour: the shop's palette as swatches, or any colour of the customer's own (a favourite dress,
 * say), answered with the nearest threads the shop has and how close each is, in words.
 */
export function ThreadPicker({
  name,
  legend,
  threads,
  value,
  onChange,
}: {
  name: string;
  legend: string;
  threads: readonly ThreadColourSummary[];
  value: string;
  onChange: (code: string) => void;
}) {
  const colourId = useId();
  const chosen = threads.find((thread) => thread.code === value);
  const [wanted, setWanted] = useState<string>();
  const offers = wanted ? offerNearestThreads(wanted, threads) : [];
  return (
    <div className="space-y-3">
      <ThreadChoice name={name} legend={legend} threads={threads} value={value} onChange={onChange} />
      <div className="rounded-lg bg-linen-100 p-3">
        <label htmlFor={colourId} className="flex min-h-11 cursor-pointer items-center gap-3 text-sm">
          <input
            id={colourId}
            type="color"
            value={wanted ?? chosen?.hex.toLowerCase() ?? '#ffffff'}
            onChange={(event) => setWanted(event.target.value)}
            className="h-11 w-14 cursor-pointer rounded-lg border border-linen-300 bg-white"
          />
          <span>Match a colour of your own</span>
        </label>
        {wanted && (
          <div className="mt-2">
            <p id={`${colourId}-matches`} className="text-sm text-walnut-700">
              Our nearest threads to {wanted}:
            </p>
            <ul aria-labelledby={`${colourId}-matches`} className="mt-1 space-y-1">
              {offers.map(({ thread, deltaE, words }) => (
                <li key={thread.code}>
                  <button
                    type="button"
                    aria-pressed={thread.code === value}
                    onClick={() => onChange(thread.code)}
                    className="flex min-h-11 w-full items-center gap-3 rounded-lg border border-linen-300 bg-white px-3 text-left text-sm hover:bg-linen-50 aria-pressed:border-madder-500"
                  >
                    <span
                      aria-hidden="true"
                      className="h-7 w-7 shrink-0 rounded-full ring-1 ring-walnut-900/15"
                      style={{ backgroundColor: thread.hex }}
                    />
                    <span className="flex-1">
                      <span className="font-medium">{thread.name}</span>{' '}
                      <span className="text-walnut-500">{thread.code}</span>
                    </span>
                    <span className="text-walnut-700">
                      ΔE {deltaE.toFixed(1)}: {words}
                    </span>
                  </button>
                </li>
              ))}
            </ul>
            <p className="mt-1 text-xs text-walnut-500">
              ΔE measures how different two colours look (CIEDE2000); the smaller, the closer.
            </p>
          </div>
        )}
      </div>
    </div>
  );
}
