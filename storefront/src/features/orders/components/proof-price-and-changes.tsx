import type { CustomerProof } from '@server/contracts/orders.ts';
import { formatMoney } from '@ui/format.ts';

/** What the studio changed in this version, and its price against the previous one when it moved. */
export function ProofPriceAndChanges({ proof, currency }: { proof: CustomerProof; currency: string }) {
  const { price, changes } = proof;
  const hasNewPrice = price !== null && price.totalCents !== price.previousTotalCents;
  if (!hasNewPrice && changes.length === 0) return null;
  return (
    <section aria-label={`What changed in version ${proof.version}`} className="rounded-lg bg-saffron-100 p-3 text-sm">
      {hasNewPrice && (
        <p>
          New price: <strong className="tabular-nums">{formatMoney(price.totalCents, currency)}</strong>{' '}
          <span className="text-walnut-700">(before: {formatMoney(price.previousTotalCents, currency)})</span>
          {proof.isAnswerable &&
            (price.totalCents > price.previousTotalCents
              ? '. Approving this proof agrees to the new price.'
              : '. You will be charged the lower amount.')}
        </p>
      )}
      {changes.length > 0 && (
        <ul className="mt-1 list-disc pl-5">
          {changes.map((change) => (
            <li key={change}>{change}</li>
          ))}
        </ul>
      )}
    </section>
  );
}
