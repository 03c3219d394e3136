import type { FakeStripeContext } from './fake-stripe-context.ts';
import type { Charge, CheckoutSessionRecord, PaymentIntent } from './fake-stripe-state.ts';
import type { AcceptedCard } from './test-cards.ts';

// Customer-initiated online card authorizations last 7 days (docs.stripe.com/payments/place-a-hold-on-a-payment-method,
// via ../shared/reference/trade-facts.md).
const AUTHORIZATION_WINDOW_SECONDS = 7 * 24 * 60 * 60;

/**
 * Pays an open session with an accepted card: creates the PaymentIntent and its charge (authorized only when the
 * session asked for manual capture), completes the session and announces both by webhook.
 */
export function completeCheckout(ctx: FakeStripeContext, record: CheckoutSessionRecord, card: AcceptedCard): void {
  const { session, paymentIntentData } = record;
  const created = ctx.nowSeconds();
  const isManual = paymentIntentData.captureMethod === 'manual';
  const amount = session.amount_total;
  const intentId = ctx.nextId('pi');
  const charge: Charge = {
    id: ctx.nextId('ch'),
    object: 'charge',
    amount,
    amount_captured: isManual ? 0 : amount,
    amount_refunded: 0,
    billing_details: { name: card.holderName },
    captured: !isManual,
    created,
    currency: session.currency,
    livemode: false,
    metadata: { ...paymentIntentData.metadata },
    paid: true,
    payment_intent: intentId,
    payment_method_details: {
      type: 'card',
      card: {
        brand: card.brand,
        last4: card.last4,
        exp_month: card.expMonth,
        exp_year: card.expYear,
        capture_before: isManual ? created + AUTHORIZATION_WINDOW_SECONDS : null,
      },
    },
    refunded: false,
    status: 'succeeded',
  };
  const intent: PaymentIntent = {
    id: intentId,
    object: 'payment_intent',
    amount,
    amount_capturable: isManual ? amount : 0,
    amount_received: isManual ? 0 : amount,
    canceled_at: null,
    cancellation_reason: null,
    capture_method: paymentIntentData.captureMethod,
    created,
    currency: session.currency,
    description: paymentIntentData.description,
    latest_charge: charge.id,
    livemode: false,
    metadata: { ...paymentIntentData.metadata },
    payment_method_types: ['card'],
    status: isManual ? 'requires_capture' : 'succeeded',
  };
  ctx.state.charges.set(charge.id, charge);
  ctx.state.paymentIntents.set(intent.id, intent);
  // With manual capture nothing has been collected yet, so the session reports `unpaid`: read the PaymentIntent.
  Object.assign(session, {
    status: 'complete',
    payment_status: isManual ? 'unpaid' : 'paid',
    payment_intent: intent.id,
    url: null,
  });
  ctx.emit('checkout.session.completed', session);
  ctx.emit(isManual ? 'payment_intent.amount_capturable_updated' : 'payment_intent.succeeded', intent);
}
