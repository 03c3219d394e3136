import type { CustomerOrderResponse } from '@server/contracts/orders.ts';
import { Button } from '@ui/components/button.tsx';
import { formatMoney } from '@ui/format.ts';
import { useRetryPayment } from '../api/order-actions.ts';

interface PaymentStateProps {
  order: CustomerOrderResponse;
  /** The customer just came back from the payment page: `done` while its confirmation is on its way. */
  checkoutReturn: 'done' | 'cancelled' | null;
}

const day = (iso: string) => new Date(iso).toLocaleDateString('en-US', { month: 'long', day: 'numeric' });

/**
 * What the card has been asked for: held, charged or refunded, or why a payment did not go through with a way to
 * try another card. Right after the payment page it waits for the provider's confirmation.
 */
export function PaymentState({ order, checkoutReturn }: PaymentStateProps) {
  const retry = useRetryPayment(order.order.number);
  const { payment, order: summary } = order;
  const money = (cents: number) => formatMoney(cents, summary.currency);
  const canPay = order.actions.includes('pay');
  const pay = () => retry.mutate(undefined, { onSuccess: (started) => window.location.assign(started.checkoutUrl) });
  const hasApproved = order.proofs.some((proof) => proof.status === 'approved');
  const isConfirming = checkoutReturn === 'done' && summary.status === 'awaiting_payment' && !payment.failureMessage;

  return (
    <section aria-labelledby="payment-heading" className="rounded-card border border-linen-200 bg-white p-5 shadow-sm">
      <h2 id="payment-heading" className="text-lg font-semibold">
        Payment
      </h2>
      <div role="status" aria-live="polite" className="mt-2 space-y-1 text-sm text-walnut-700">
        {isConfirming && <p>Confirming your payment with the card company…</p>}
        {payment.heldCents > 0 && (
          <p>
            <strong className="font-semibold">{money(payment.heldCents)}</strong> is held on your card, not charged.{' '}
            {hasApproved
              ? 'You have approved your proof, so we charge it as we start stitching'
              : 'We charge it once you approve your proof'}
            {payment.holdExpiresAt ? ` (the hold lasts until ${day(payment.holdExpiresAt)})` : ''}.
          </p>
        )}
        {payment.isCardSaved && payment.chargedCents === 0 && (
          <p>
            Your card is saved with our payment provider; nothing has been taken yet.{' '}
            {hasApproved
              ? `You have approved your proof, so we charge ${money(summary.totalCents)} as we start stitching.`
              : `We charge the order's total (${money(summary.totalCents)} now) once you approve your proof. A hold on the card would run out before your order is due, so we keep the card instead.`}
          </p>
        )}
        {payment.chargedCents > 0 && (
          <p>
            <strong className="font-semibold">{money(payment.chargedCents)}</strong> charged.
          </p>
        )}
        {payment.refundedCents > 0 && (
          <p>
            <strong className="font-semibold">{money(payment.refundedCents)}</strong> refunded to your card.
          </p>
        )}
        {!isConfirming && summary.status === 'awaiting_payment' && !payment.failureMessage && (
          <p>
            {checkoutReturn === 'cancelled'
              ? 'You left the payment page, so your card was not charged.'
              : 'Not paid yet: your card has not been charged.'}
          </p>
        )}
      </div>
      {payment.confirmPaymentUrl ? (
        <div role="alert" className="mt-3 rounded-lg bg-madder-50 p-3 text-sm text-madder-700">
          <p className="font-semibold">{payment.failureMessage}</p>
          <p>
            Nothing has been charged. Pay {money(summary.totalCents)} on the secure payment page and we start stitching
            straight away.
          </p>
          <a
            href={payment.confirmPaymentUrl}
            className="mt-3 inline-block rounded-lg bg-walnut-700 px-4 py-2 font-semibold text-white focus:outline-none focus-visible:ring-2 focus-visible:ring-walnut-500"
          >
            Confirm and pay {money(summary.totalCents)}
          </a>
        </div>
      ) : (
        payment.failureMessage && (
          <div role="alert" className="mt-3 rounded-lg bg-madder-50 p-3 text-sm text-madder-700">
            <p className="font-semibold">{payment.failureMessage}</p>
            <p>Your card has not been charged. You can try again with another card.</p>
          </div>
        )
      )}
      {canPay && !payment.confirmPaymentUrl && (
        <Button className="mt-4" onClick={pay} disabled={retry.isPending || isConfirming}>
          {retry.isPending
            ? 'Opening the payment page…'
            : payment.failureMessage || checkoutReturn === 'cancelled'
              ? 'Try another card'
              : 'Pay now'}
        </Button>
      )}
      {retry.isError && (
        <p role="alert" className="mt-2 text-sm text-madder-700">
          {retry.error.message}
        </p>
      )}
    </section>
  );
}
