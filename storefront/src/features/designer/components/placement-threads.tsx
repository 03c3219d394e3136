import type { ThreadColourSummary } from '@server/contracts/catalogue.ts';
import type { BorderPlacement, MotifPlacement } from '@server/contracts/designs.ts';
import type { Dispatch } from '../commands/command-registry.ts';
import { ThreadPicker } from './thread-picker.tsx';

/** One thread per colour of a motif or border, in stitching order; each colour folds away until wanted. */
export function PlacementThreads({
  placement,
  threads,
  dispatch,
}: {
  placement: MotifPlacement | BorderPlacement;
  threads: readonly ThreadColourSummary[];
  dispatch: Dispatch;
}) {
  const nameOf = (code: string) => threads.find((thread) => thread.code === code)?.name ?? code;
  const count = placement.threads.length;
  return (
    <div className="space-y-2">
      <h3 className="text-sm font-medium">Thread colours</h3>
      {placement.threads.map((code, index) => {
        const legend = count === 1 ? 'Thread colour' : `Colour ${index + 1} of ${count}`;
        return (
          <details key={index} className="rounded-lg border border-linen-200">
            <summary className="flex min-h-11 cursor-pointer items-center gap-3 px-3 text-sm">
              <span
                aria-hidden="true"
                className="h-6 w-6 rounded-full ring-1 ring-walnut-900/15"
                style={{ backgroundColor: threads.find((thread) => thread.code === code)?.hex }}
              />
              <span>
                {legend}: {nameOf(code)}
              </span>
            </summary>
            <div className="border-t border-linen-200 p-3">
              <ThreadPicker
                name={`${placement.id}-thread-${index}`}
                legend={legend}
                threads={threads}
                value={code}
                onChange={(thread) => dispatch('set-thread-colour', { id: placement.id, index, thread })}
              />
            </div>
          </details>
        );
      })}
    </div>
  );
}
