import { z } from 'zod';
import { invalidRequest, resourceMissing } from './api-error.ts';
import { newCharge } from './complete-checkout.ts';
import type { FakeStripeContext } from './fake-stripe-context.ts';
import type { PaymentIntent } from './fake-stripe-state.ts';
import { currency, expand, metadata, parseParams, positiveAmount } from './form-params.ts';

const formBoolean = z.enum(['true', 'false']).transform((value) => value === 'true');

const createIntentSchema = z.object({
  amount: positiveAmount,
  currency,
  customer: z.string().optional(),
  payment_method: z.string().optional(),
  off_session: formBoolean.optional(),
  confirm: formBoolean.optional(),
  capture_method: z.enum(['automatic', 'automatic_async', 'manual']).optional(),
  description: z.string().max(1000).optional(),
  metadata: metadata.optional(),
  expand,
});

/** Stripe's card error for a charge the bank wants the cardholder to authenticate (Stripe docs, from memory). */
const AUTHENTICATION_REQUIRED = {
  type: 'card_error' as const,
  code: 'authentication_required',
  decline_code: 'authentication_required',
  message: 'Your card was declined. This transaction requires authentication.',
};

/**
 * `POST /v1/payment_intents` as a shop charges a card it saved: `customer`, `payment_method`, `off_session: true`
 * and `confirm: true`. The charge succeeds at once (or is held, with manual capture) unless the card's bank asks
 * for the cardholder, when the intent is left `requires_payment_method` with `last_payment_error` and the answer
 * is a 402 card error naming it.
 */
export function createOffSessionPayment(
  ctx: FakeStripeContext,
  body: unknown,
): { intent: PaymentIntent; error?: typeof AUTHENTICATION_REQUIRED } {
  const params = parseParams(createIntentSchema, body);
  if (!params.confirm || !params.payment_method) {
    throw invalidRequest(
      'This stand-in creates PaymentIntents only to confirm a saved card at once: send payment_method and confirm=true.',
      {
        param: params.payment_method ? 'confirm' : 'payment_method',
      },
    );
  }
  const method = ctx.state.paymentMethods.get(params.payment_method);
  if (!method) throw resourceMissing('payment_method', params.payment_method);
  if (params.off_session && (!params.customer || method.customer !== params.customer)) {
    throw invalidRequest(
      `The provided PaymentMethod (${method.id}) was previously used with a PaymentIntent without Customer attachment, shared with a connected account without Customer attachment, or was detached from a Customer. It may not be used again.`,
      { param: 'payment_method', code: 'payment_method_unexpected_state' },
    );
  }
  const isManual = params.capture_method === 'manual';
  const id = ctx.nextId('pi');
  const intent: PaymentIntent = {
    id,
    object: 'payment_intent',
    amount: params.amount,
    amount_capturable: 0,
    amount_received: 0,
    canceled_at: null,
    cancellation_reason: null,
    capture_method: params.capture_method ?? 'automatic',
    created: ctx.nowSeconds(),
    currency: params.currency,
    customer: params.customer ?? null,
    description: params.description ?? null,
    last_payment_error: null,
    latest_charge: null,
    livemode: false,
    metadata: params.metadata ?? {},
    payment_method: method.id,
    payment_method_types: ['card'],
    setup_future_usage: null,
    status: 'requires_payment_method',
  };
  ctx.state.paymentIntents.set(id, intent);
  if (params.off_session && ctx.state.cardsNeedingAuthentication.has(method.id)) {
    intent.last_payment_error = AUTHENTICATION_REQUIRED;
    ctx.emit('payment_intent.payment_failed', intent);
    return { intent, error: AUTHENTICATION_REQUIRED };
  }
  const charge = newCharge(
    ctx,
    { id, amount: params.amount, currency: params.currency, metadata: intent.metadata, isManual },
    method.card,
    method.billing_details.name,
  );
  ctx.state.charges.set(charge.id, charge);
  Object.assign(intent, {
    latest_charge: charge.id,
    amount_capturable: isManual ? params.amount : 0,
    amount_received: isManual ? 0 : params.amount,
    status: isManual ? 'requires_capture' : 'succeeded',
  });
  ctx.emit(isManual ? 'payment_intent.amount_capturable_updated' : 'payment_intent.succeeded', intent);
  return { intent };
}
