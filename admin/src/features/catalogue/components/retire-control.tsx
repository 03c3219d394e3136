import { useState } from 'react';
import { useSetCatalogueRowActive } from '../api/set-catalogue-row-active.ts';
import type { CatalogueKind } from '../api/save-catalogue-row.ts';
import { smallButtonClassName as smallButton } from './form-field.tsx';

/**
 * Hide from customers, or offer again, after a second click that says what retiring means: what already uses
 * the row (saved designs, orders) keeps it.
 */
export function RetireControl({
  kind,
  id,
  name,
  isActive,
}: {
  kind: CatalogueKind;
  id: number;
  name: string;
  isActive: boolean;
}) {
  const [isConfirming, setIsConfirming] = useState(false);
  const change = useSetCatalogueRowActive(kind);
  const apply = () => change.mutate({ id, isActive: !isActive }, { onSuccess: () => setIsConfirming(false) });
  if (!isConfirming) {
    return (
      <button
        type="button"
        className={smallButton}
        onClick={() => setIsConfirming(true)}
        aria-label={`${isActive ? 'Retire' : 'Bring back'} ${name}`}
      >
        {isActive ? 'Retire' : 'Bring back'}
      </button>
    );
  }
  return (
    <div
      role="group"
      aria-label={`Confirm for ${name}`}
      className="grid gap-2 rounded-lg border border-saffron-500/50 bg-saffron-100 p-2 text-sm"
    >
      <p>
        {isActive
          ? `Hide “${name}” from customers? Saved designs and orders that use it keep it.`
          : `Offer “${name}” to customers again?`}
      </p>
      <div className="flex flex-wrap gap-2">
        <button
          type="button"
          className={`${smallButton} border-madder-600 bg-madder-600 text-white hover:bg-madder-700`}
          onClick={apply}
          disabled={change.isPending}
          autoFocus
        >
          {isActive ? 'Yes, retire it' : 'Yes, bring it back'}
        </button>
        <button type="button" className={smallButton} onClick={() => setIsConfirming(false)}>
          Keep as it is
        </button>
      </div>
      {change.isError && (
        <p role="alert" className="text-madder-700">
          {change.error.message}
        </p>
      )}
    </div>
  );
}
