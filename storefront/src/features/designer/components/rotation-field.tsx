import { useId } from 'react';
import type { Dispatch } from '../commands/command-registry.ts';
import { ROTATE_STEP_DEG } from '../commands/rotate-placement.ts';

const stepButton =
  'inline-flex min-h-11 items-center rounded-full border border-linen-300 bg-white px-4 text-sm hover:bg-linen-100';

/** How far an item is turned, with buttons for a step each way and back to upright; R and Shift+R do the same. */
export function RotationField({
  id,
  label,
  rotationDeg,
  dispatch,
}: {
  id: string;
  label: string;
  rotationDeg: number;
  dispatch: Dispatch;
}) {
  const fieldId = useId();
  const words =
    rotationDeg === 0 ? 'upright' : `${Math.abs(rotationDeg)}° ${rotationDeg > 0 ? 'clockwise' : 'anticlockwise'}`;
  return (
    <div>
      <label htmlFor={fieldId} className="flex items-baseline justify-between gap-2 text-sm font-medium">
        <span>Turn</span>
        <span className="font-normal text-walnut-700">{words}</span>
      </label>
      <input
        id={fieldId}
        type="range"
        min={-180}
        max={180}
        step={1}
        value={rotationDeg}
        aria-valuetext={words}
        onChange={(event) => dispatch('rotate-placement', { id, toDeg: Number(event.target.value) })}
        className="mt-2 h-11 w-full accent-madder-600"
      />
      <div className="flex flex-wrap gap-2">
        <button
          type="button"
          className={stepButton}
          aria-label={`Turn ${label} ${ROTATE_STEP_DEG}° anticlockwise`}
          onClick={() => dispatch('rotate-placement', { id, byDeg: -ROTATE_STEP_DEG })}
        >
          <span aria-hidden="true">↺ {ROTATE_STEP_DEG}°</span>
        </button>
        <button
          type="button"
          className={stepButton}
          aria-label={`Turn ${label} ${ROTATE_STEP_DEG}° clockwise`}
          onClick={() => dispatch('rotate-placement', { id, byDeg: ROTATE_STEP_DEG })}
        >
          <span aria-hidden="true">↻ {ROTATE_STEP_DEG}°</span>
        </button>
        <button
          type="button"
          className={stepButton}
          disabled={rotationDeg === 0}
          onClick={() => dispatch('rotate-placement', { id, toDeg: 0 })}
        >
          Upright
        </button>
      </div>
    </div>
  );
}
