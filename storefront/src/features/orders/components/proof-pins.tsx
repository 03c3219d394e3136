import type { ProofPin } from '@server/contracts/orders.ts';

/** Pins drawn over the proof picture, numbered as in the list beside it. */
export function ProofPins({
  pins,
  tone,
}: {
  pins: readonly Pick<ProofPin, 'xPct' | 'yPct'>[];
  tone: 'saved' | 'draft';
}) {
  return (
    <>
      {pins.map((pin, index) => (
        <span
          key={index}
          aria-hidden="true"
          style={{ left: `${pin.xPct}%`, top: `${pin.yPct}%` }}
          className={`pointer-events-none absolute flex h-7 w-7 -translate-x-1/2 -translate-y-full items-center justify-center rounded-full rounded-bl-none border-2 border-white text-xs font-bold text-white shadow ${
            tone === 'draft' ? 'bg-madder-600' : 'bg-walnut-700'
          }`}
        >
          {index + 1}
        </span>
      ))}
    </>
  );
}
