import { useState } from 'react';
import { Button } from '@ui/components/button.tsx';
import { useCancelOrder } from '../api/order-actions.ts';

/** Cancelling before anything is charged, with one confirming step so it is never a slip of the finger. */
export function CancelOrderButton({ number }: { number: string }) {
  const cancel = useCancelOrder(number);
  const [isAsking, setIsAsking] = useState(false);
  if (!isAsking) {
    return (
      <Button tone="quiet" onClick={() => setIsAsking(true)}>
        Cancel this order
      </Button>
    );
  }
  return (
    <div
      role="group"
      aria-label="Cancel the order?"
      className="rounded-lg border border-linen-300 bg-linen-50 p-3 text-sm"
    >
      <p>Cancel {number}? Any hold on your card is released and nothing is charged.</p>
      <div className="mt-2 flex flex-wrap gap-2">
        <Button onClick={() => cancel.mutate()} disabled={cancel.isPending}>
          {cancel.isPending ? 'Cancelling…' : 'Yes, cancel it'}
        </Button>
        <Button tone="quiet" onClick={() => setIsAsking(false)}>
          Keep my order
        </Button>
      </div>
      {cancel.isError && (
        <p role="alert" className="mt-2 text-madder-700">
          {cancel.error.message}
        </p>
      )}
    </div>
  );
}
