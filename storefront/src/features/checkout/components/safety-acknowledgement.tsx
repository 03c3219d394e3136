import { useId } from 'react';
import type { GuidanceMessageSummary } from '@server/contracts/guidance.ts';
import { SafetyCautions } from '../../../components/safety-cautions.tsx';

/**
 * The safety notes for the garment and size being ordered, and, when any is more than good practice, the tick box
 * the customer must tick before paying (the server refuses the order without it).
 */
export function SafetyAcknowledgement({
  cautions,
  sizeLabel,
  needsTick,
  isTicked,
  onTick,
}: {
  cautions: readonly GuidanceMessageSummary[];
  sizeLabel: string | undefined;
  needsTick: boolean;
  isTicked: boolean;
  onTick: (isTicked: boolean) => void;
}) {
  const id = useId();
  return (
    <div className="space-y-2 rounded-lg border border-linen-200 p-3">
      <SafetyCautions
        cautions={cautions}
        heading={sizeLabel ? `Before you pay: safety notes for size ${sizeLabel}` : 'Before you pay: safety notes'}
      />
      {needsTick && (
        <label htmlFor={`${id}-read`} className="flex min-h-11 items-start gap-3 text-sm font-medium">
          <input
            id={`${id}-read`}
            type="checkbox"
            checked={isTicked}
            onChange={(event) => onTick(event.target.checked)}
            className="mt-0.5 h-5 w-5 shrink-0 accent-madder-600"
          />
          I have read these safety notes and will follow them for the child who wears it.
        </label>
      )}
    </div>
  );
}
