import type { BorderPlacement } from '@server/contracts/designs.ts';
import type { Dispatch } from '../commands/command-registry.ts';
import { layoutBorder, type BorderLayout } from '../model/border-layout.ts';
import type { DesignSetting } from '../model/design-setting.ts';

const percentOf = (layout: Extract<BorderLayout, { ok: true }>) => `${Math.round(layout.fit.scale * 1000) / 10} %`;

/**
 * One more or one fewer repeat along the hem: each button says the size the engine would stitch them at, or, when
 * that many cannot be stitched, the engine's reason, and stays off.
 */
export function BorderRepeats({
  border,
  setting,
  sizeId,
  dispatch,
}: {
  border: BorderPlacement;
  setting: DesignSetting;
  sizeId: number;
  dispatch: Dispatch;
}) {
  const current = layoutBorder(setting, sizeId, border);
  if (!current.ok) return null;
  const options = [
    { by: -1, verb: 'One fewer' },
    { by: 1, verb: 'One more' },
  ].map(({ by, verb }) => {
    const count = current.fit.count + by;
    const trial = count >= 1 ? layoutBorder(setting, sizeId, { ...border, count }) : undefined;
    return { by, verb, count, trial };
  });
  return (
    <div className="space-y-2">
      <h3 className="text-sm font-medium">Repeats</h3>
      {options.map(({ by, verb, count, trial }) => (
        <div key={by}>
          <button
            type="button"
            disabled={!trial?.ok}
            aria-describedby={`${border.id}-repeats-${by}`}
            onClick={() => dispatch('update-border', { id: border.id, count })}
            className="inline-flex min-h-11 items-center rounded-full border border-linen-300 bg-white px-4 text-sm hover:bg-linen-100 disabled:opacity-45"
          >
            {verb} ({count})
          </button>
          <p id={`${border.id}-repeats-${by}`} className="mt-1 text-xs text-walnut-500">
            {trial?.ok
              ? `${count} repeats, each stitched at ${percentOf(trial)} of its drawn size.`
              : trial
                ? trial.reason
                : 'A border needs at least one repeat.'}
          </p>
        </div>
      ))}
    </div>
  );
}
