import type { FakeStripeContext } from './fake-stripe-context.ts';
import type { PaymentIntent } from './fake-stripe-state.ts';

/**
 * An uncaptured authorization lapses at its charge's `capture_before`: the PaymentIntent turns `canceled` with
 * `cancellation_reason: 'automatic'` and the hold is released (Stripe docs: place a hold on a payment method, from
 * memory). The stand-in applies this whenever its clock is read for a request, so a capture after that moment
 * fails as it would on the real service.
 */
export function expireLapsedHolds(ctx: FakeStripeContext): void {
  const now = ctx.nowSeconds();
  for (const intent of ctx.state.paymentIntents.values()) {
    if (intent.status !== 'requires_capture') continue;
    const captureBefore = ctx.state.charges.get(intent.latest_charge ?? '')?.payment_method_details.card.capture_before;
    if (captureBefore != null && captureBefore <= now) lapse(ctx, intent);
  }
}

/** Lets one hold lapse now, whatever its `capture_before` (the test control route). */
export function expireHoldNow(ctx: FakeStripeContext, intent: PaymentIntent): void {
  const charge = ctx.state.charges.get(intent.latest_charge ?? '');
  if (charge) charge.payment_method_details.card.capture_before = ctx.nowSeconds();
  lapse(ctx, intent);
}

function lapse(ctx: FakeStripeContext, intent: PaymentIntent): void {
  Object.assign(intent, {
    status: 'canceled',
    amount_capturable: 0,
    canceled_at: ctx.nowSeconds(),
    cancellation_reason: 'automatic',
  });
  ctx.emit('payment_intent.canceled', intent);
}
