import type { OrderDetailResponse } from '@server/contracts/admin-orders.ts';
import { formatMoney } from '@ui/format.ts';

const paymentWords: Record<string, string> = {
  pending: 'Checkout started',
  authorized: 'Card held, not charged',
  saved: 'Card saved for later, nothing held',
  captured: 'Charged',
  partially_refunded: 'Partly refunded',
  refunded: 'Refunded',
  voided: 'Hold released',
  failed: 'Card declined',
};

/** The priced lines exactly as quoted, and what happened to the card. */
export function OrderMoney({ detail }: { detail: OrderDetailResponse }) {
  const { order, quote, payments } = detail;
  const money = (cents: number) => formatMoney(cents, order.currency);
  return (
    <div className="grid gap-4">
      <table className="w-full text-sm">
        <caption className="mb-1 text-left text-xs text-walnut-500">
          Priced with price list version {quote.ruleSetVersion}
        </caption>
        <tbody>
          {quote.lines.map((line, index) => (
            <tr key={`${line.code}-${index}`} className="border-t border-linen-200">
              <td className="py-1.5 pr-3">{line.label}</td>
              <td className="py-1.5 text-right tabular-nums">{money(line.amountCents)}</td>
            </tr>
          ))}
          <tr className="border-t-2 border-walnut-700 font-semibold">
            <td className="py-1.5">Total</td>
            <td className="py-1.5 text-right tabular-nums">{money(order.totalCents)}</td>
          </tr>
        </tbody>
      </table>
      {payments.length === 0 ? (
        <p className="text-sm text-walnut-500">No payment yet.</p>
      ) : (
        <ul className="grid gap-2 text-sm">
          {payments.map((payment, index) => (
            <li key={index} className="rounded-lg bg-linen-100 p-3">
              <p className="font-medium">
                {payment.method === 'off_session' && payment.status === 'captured'
                  ? 'Charged to the saved card'
                  : payment.method === 'payment_link' && payment.status === 'pending'
                    ? 'Payment link sent, waiting for the customer'
                    : (paymentWords[payment.status] ?? payment.status)}
              </p>
              <p className="text-walnut-700">
                Held {money(payment.authorizedCents)} · charged {money(payment.capturedCents)}
                {payment.refundedCents > 0 && ` · refunded ${money(payment.refundedCents)}`}
              </p>
              {payment.status === 'authorized' && payment.captureBefore && (
                <p className="text-xs text-madder-700">
                  Charge before {new Date(payment.captureBefore).toUTCString().slice(0, 16)}, or the hold lapses
                  {payment.isCardKept ? '; the card is also saved, so a later charge can still be made.' : '.'}
                </p>
              )}
              {payment.status === 'saved' && (
                <p className="text-xs text-walnut-700">
                  The work is due after a hold would run out, so the card is saved instead and charged when the customer
                  approves the proof.
                </p>
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
