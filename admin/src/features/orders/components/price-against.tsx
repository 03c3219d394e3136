import type { RepricedOrder } from '@server/contracts/proof-versions.ts';
import { formatMoney } from '@ui/format.ts';

/** The server's new price beside what the customer authorized, and which way it moved. */
export function PriceAgainst({ price, label = 'New price' }: { price: RepricedOrder; label?: string }) {
  const { totalCents, authorizedTotalCents, differenceCents, currency } = price;
  const moved =
    differenceCents === 0
      ? 'the same as the customer authorized'
      : differenceCents > 0
        ? `${formatMoney(differenceCents, currency)} more than the customer authorized: they approve it with the proof`
        : `${formatMoney(-differenceCents, currency)} less than the customer authorized: the charge is the lower amount`;
  return (
    <div className="grid gap-1 rounded-lg bg-linen-50 p-3 text-sm" aria-live="polite">
      <p>
        <span className="font-medium">{label}: </span>
        <strong className="tabular-nums">{formatMoney(totalCents, currency)}</strong>
        <span className="text-walnut-500"> · authorized {formatMoney(authorizedTotalCents, currency)}</span>
      </p>
      <p className={differenceCents > 0 ? 'text-madder-700' : 'text-walnut-700'}>That is {moved}.</p>
      {price.isPriceProvisional && (
        <p className="text-walnut-500">A picture is still priced at the minimum until its stitch file is entered.</p>
      )}
    </div>
  );
}
