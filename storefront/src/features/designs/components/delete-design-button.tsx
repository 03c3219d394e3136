import { useState } from 'react';
import type { SavedDesign } from '@server/contracts/saved-designs.ts';
import { ApiError } from '@ui/api-client.ts';
import { Button } from '@ui/components/button.tsx';
import { useDeleteDesign } from '../api/delete-design.ts';

/**
 * Deletes a design after a second, explicit yes. A design in an order is kept by the server (409): its message
 * names the order, and the customer is told why and what to do instead.
 */
export function DeleteDesignButton({ design }: { design: SavedDesign }) {
  const [isAsking, setIsAsking] = useState(false);
  const remove = useDeleteDesign();
  const isOrdered = remove.error instanceof ApiError && remove.error.kind === 'conflict';
  if (remove.isError) {
    return (
      <div role="alert" className="rounded-lg bg-madder-50 p-3 text-sm text-madder-700">
        <p>{remove.error.message}</p>
        {isOrdered && (
          <p className="mt-1">
            The studio keeps every design that is in an order, so it makes exactly what you ordered. To change it, make
            a copy and change that.
          </p>
        )}
        <Button tone="quiet" className="mt-2" autoFocus onClick={() => remove.reset()}>
          OK
        </Button>
      </div>
    );
  }
  if (!isAsking) {
    return (
      <Button tone="quiet" onClick={() => setIsAsking(true)}>
        Delete
      </Button>
    );
  }
  return (
    <div
      role="group"
      aria-label={`Delete “${design.name}”?`}
      className="flex flex-wrap items-center gap-2 rounded-lg bg-madder-50 p-3 text-sm"
    >
      <span className="text-madder-700">Delete “{design.name}” for good?</span>
      <Button disabled={remove.isPending} onClick={() => remove.mutate(design.id)}>
        {remove.isPending ? 'Deleting…' : 'Yes, delete it'}
      </Button>
      {/* Focus lands on the safe answer, so a stray Enter keeps the design. */}
      <Button tone="quiet" autoFocus onClick={() => setIsAsking(false)}>
        Keep it
      </Button>
    </div>
  );
}
