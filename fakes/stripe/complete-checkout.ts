import { saveCard } from './customers.ts';
import type { FakeStripeContext } from './fake-stripe-context.ts';
import type { Charge, CheckoutSessionRecord, PaymentIntent, SetupIntent } from './fake-stripe-state.ts';
import type { AcceptedCard } from './test-cards.ts';

// Customer-initiated online card authorizations last 7 days (docs.stripe.com/payments/place-a-hold-on-a-payment-method,
// via ../shared/reference/trade-facts.md).
export const AUTHORIZATION_WINDOW_SECONDS = 7 * 24 * 60 * 60;

/** A card charge on an intent: captured at once, or only authorized (manual capture) until `capture_before`. */
export function newCharge(
  ctx: FakeStripeContext,
  intent: { id: string; amount: number; currency: string; metadata: Record<string, string>; isManual: boolean },
  card: { brand: string; last4: string; exp_month: number; exp_year: number },
  holderName: string,
): Charge {
  const created = ctx.nowSeconds();
  return {
    id: ctx.nextId('ch'),
    object: 'charge',
    amount: intent.amount,
    amount_captured: intent.isManual ? 0 : intent.amount,
    amount_refunded: 0,
    billing_details: { name: holderName },
    captured: !intent.isManual,
    created,
    currency: intent.currency,
    livemode: false,
    metadata: { ...intent.metadata },
    paid: true,
    payment_intent: intent.id,
    payment_method_details: {
      type: 'card',
      card: { ...card, capture_before: intent.isManual ? created + AUTHORIZATION_WINDOW_SECONDS : null },
    },
    refunded: false,
    status: 'succeeded',
  };
}

/** Setup mode: the card is kept on the session's customer through a SetupIntent, and nothing is charged. */
function completeSetup(ctx: FakeStripeContext, record: CheckoutSessionRecord, card: AcceptedCard): void {
  const { session } = record;
  const setupIntent: SetupIntent = {
    id: ctx.nextId('seti'),
    object: 'setup_intent',
    created: ctx.nowSeconds(),
    customer: session.customer,
    livemode: false,
    metadata: { ...record.setupIntentMetadata },
    payment_method: saveCard(ctx, card, session.customer),
    status: 'succeeded',
    usage: 'off_session',
  };
  ctx.state.setupIntents.set(setupIntent.id, setupIntent);
  Object.assign(session, {
    status: 'complete',
    payment_status: 'no_payment_required',
    setup_intent: setupIntent.id,
    url: null,
  });
  ctx.emit('checkout.session.completed', session);
  ctx.emit('setup_intent.succeeded', setupIntent);
}

/**
 * Pays an open session with an accepted card: creates the PaymentIntent and its charge (authorized only when the
 * session asked for manual capture), keeps the card on the customer when `setup_future_usage` asked for it,
 * completes the session and announces both by webhook. A setup-mode session only keeps the card.
 */
export function completeCheckout(ctx: FakeStripeContext, record: CheckoutSessionRecord, card: AcceptedCard): void {
  if (record.session.mode === 'setup') return completeSetup(ctx, record, card);
  const { session, paymentIntentData } = record;
  const isManual = paymentIntentData.captureMethod === 'manual';
  const amount = session.amount_total;
  const intentId = ctx.nextId('pi');
  const paymentMethod = paymentIntentData.setupFutureUsage
    ? saveCard(ctx, card, session.customer)
    : saveCard(ctx, card, null);
  const charge = newCharge(
    ctx,
    { id: intentId, amount, currency: session.currency, metadata: paymentIntentData.metadata, isManual },
    { brand: card.brand, last4: card.last4, exp_month: card.expMonth, exp_year: card.expYear },
    card.holderName,
  );
  const intent: PaymentIntent = {
    id: intentId,
    object: 'payment_intent',
    amount,
    amount_capturable: isManual ? amount : 0,
    amount_received: isManual ? 0 : amount,
    canceled_at: null,
    cancellation_reason: null,
    capture_method: paymentIntentData.captureMethod,
    created: charge.created,
    currency: session.currency,
    customer: session.customer,
    description: paymentIntentData.description,
    last_payment_error: null,
    latest_charge: charge.id,
    livemode: false,
    metadata: { ...paymentIntentData.metadata },
    payment_method: paymentMethod,
    payment_method_types: ['card'],
    setup_future_usage: paymentIntentData.setupFutureUsage,
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
