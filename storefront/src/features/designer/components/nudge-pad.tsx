import { useState } from 'react';
import { commandOf, type Dispatch } from '../commands/command-registry.ts';

/** Smaller steps line things up by eye; bigger ones cross a yoke quickly (as Shift does with the arrow keys). */
const STEPS_MM = { small: 1, big: 10 } as const;

const arrowButton =
  'inline-flex h-11 w-11 items-center justify-center rounded-full border border-linen-300 bg-white text-lg hover:bg-linen-100 disabled:opacity-40';

/**
 * Buttons that move a placement without the canvas, and put an item on its zone's centre line. A border follows
 * the hem, so it moves only up and down.
 */
export function NudgePad({
  id,
  label,
  isBorder,
  dispatch,
}: {
  id: string;
  label: string;
  isBorder: boolean;
  dispatch: Dispatch;
}) {
  const [step, setStep] = useState<keyof typeof STEPS_MM>('small');
  const stepMm = STEPS_MM[step];
  const nudge = (dxMm: number, dyMm: number) =>
    dispatch('nudge-placement', { id, dxMm: dxMm * stepMm, dyMm: dyMm * stepMm });
  const moves: [string, string, number, number][] = [
    ['←', 'left', -1, 0],
    ['↑', 'up', 0, -1],
    ['↓', 'down', 0, 1],
    ['→', 'right', 1, 0],
  ];
  return (
    <div className="flex flex-wrap items-center gap-2">
      <span className="text-sm font-medium">Move</span>
      {moves
        .filter(([, , dx]) => !isBorder || dx === 0)
        .map(([arrow, direction, dx, dy]) => (
          <button
            key={direction}
            type="button"
            className={arrowButton}
            aria-label={`Move ${label} ${direction} ${stepMm} mm`}
            onClick={() => nudge(dx, dy)}
          >
            <span aria-hidden="true">{arrow}</span>
          </button>
        ))}
      {!isBorder && (
        <button
          type="button"
          className="inline-flex min-h-11 items-center rounded-full border border-linen-300 bg-white px-4 text-sm hover:bg-linen-100"
          onClick={() => dispatch('centre-placement', { id })}
        >
          {commandOf('centre-placement').label}
        </button>
      )}
      <label className="ml-1 inline-flex min-h-11 cursor-pointer items-center gap-2 text-sm">
        <input
          type="checkbox"
          checked={step === 'big'}
          onChange={(event) => setStep(event.target.checked ? 'big' : 'small')}
          className="h-5 w-5 accent-madder-600"
        />
        10 mm steps
      </label>
    </div>
  );
}
