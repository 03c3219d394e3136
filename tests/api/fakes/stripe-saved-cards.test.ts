/**
 * The stand-in's protocol for cards kept for later, checked through the official SDK: Customers, Checkout in setup
 * mode and with `payment_intent_data.setup_future_usage`, off-session PaymentIntents (`off_session: true, confirm:
 * true`), the `authentication_required` card error carrying its `payment_intent`, partial capture with
 * `amount_to_capture`, and holds that lapse to `canceled` with `cancellation_reason: 'automatic'`.
 */
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startStripeFake } from '../../../fakes/stripe/server.ts';
import {
  API_KEY,
  FIXED_NOW_MS,
  WEBHOOK_SECRET,
  orderSeven,
  stripeClientFor,
  submitPaymentForm,
} from './stripe-fake-helpers.ts';

// Stripe's test card that asks for authentication on every payment (Stripe's testing docs, from memory).
const AUTHENTICATE_ALWAYS = '4000 0027 6000 3184';

let fake: Awaited<ReturnType<typeof startStripeFake>>;
let stripe: Stripe;
beforeAll(async () => {
  fake = await startStripeFake({ port: 0, apiKey: API_KEY, webhookSecret: WEBHOOK_SECRET, now: () => FIXED_NOW_MS });
  stripe = stripeClientFor(fake.url);
});
afterAll(async () => {
  await fake.close();
});

async function keptCard(cardNumber = '4242 4242 4242 4242') {
  const customer = await stripe.customers.create({ email: 'parent@example.test' });
  const session = await stripe.checkout.sessions.create({
    mode: 'setup',
    currency: 'usd',
    customer: customer.id,
    success_url: 'http://127.0.0.1:3999/done',
  });
  expect((await submitPaymentForm(session.url!, { card_number: cardNumber })).status).toBe(303);
  const done = await stripe.checkout.sessions.retrieve(session.id);
  const setupIntent = await stripe.setupIntents.retrieve(done.setup_intent as string);
  return { customer, session: done, setupIntent };
}

const offSession = (customer: string, paymentMethod: string, amount = 5600) =>
  stripe.paymentIntents.create({
    amount,
    currency: 'usd',
    customer,
    payment_method: paymentMethod,
    off_session: true,
    confirm: true,
  });

describe('cards kept for later', () => {
  it('when a setup-mode session is paid, then a succeeded SetupIntent keeps the card on the customer and nothing is charged', async () => {
    const { customer, session, setupIntent } = await keptCard();
    expect(session).toMatchObject({ mode: 'setup', status: 'complete', customer: customer.id, payment_intent: null });
    expect(setupIntent).toMatchObject({ status: 'succeeded', customer: customer.id, usage: 'off_session' });
    const method = await stripe.paymentMethods.retrieve(setupIntent.payment_method as string);
    expect(method).toMatchObject({ customer: customer.id, card: { last4: '4242' } });
    expect(fake.state.events.map((e) => e.type)).toContain('setup_intent.succeeded');
  });

  it('when the kept card is charged off-session, then the PaymentIntent succeeds with the amount received', async () => {
    const { customer, setupIntent } = await keptCard();
    const intent = await offSession(customer.id, setupIntent.payment_method as string);
    expect(intent).toMatchObject({ status: 'succeeded', amount_received: 5600, customer: customer.id });
  });

  it('when the always-authenticate card is charged off-session, then the answer is authentication_required with the PaymentIntent left waiting for the customer', async () => {
    const { customer, setupIntent } = await keptCard(AUTHENTICATE_ALWAYS);
    const error = await offSession(customer.id, setupIntent.payment_method as string).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Stripe.errors.StripeCardError);
    const cardError = error as Stripe.errors.StripeCardError;
    expect(cardError.code).toBe('authentication_required');
    expect(cardError.payment_intent).toMatchObject({
      status: 'requires_payment_method',
      last_payment_error: { code: 'authentication_required' },
    });
  });

  it('when a card held with setup_future_usage is charged again off-session, then it works with the session’s customer', async () => {
    const customer = await stripe.customers.create({ email: 'parent@example.test' });
    const session = await stripe.checkout.sessions.create({
      ...orderSeven,
      customer: customer.id,
      payment_intent_data: { capture_method: 'manual', setup_future_usage: 'off_session' },
    });
    expect((await submitPaymentForm(session.url!)).status).toBe(303);
    const held = await stripe.paymentIntents.retrieve(
      (await stripe.checkout.sessions.retrieve(session.id)).payment_intent as string,
    );
    expect(held).toMatchObject({
      status: 'requires_capture',
      setup_future_usage: 'off_session',
      customer: customer.id,
    });
    const again = await offSession(customer.id, held.payment_method as string, 1000);
    expect(again.status).toBe('succeeded');
  });
});

describe('holds', () => {
  async function hold() {
    const session = await stripe.checkout.sessions.create({
      ...orderSeven,
      payment_intent_data: { capture_method: 'manual' },
    });
    await submitPaymentForm(session.url!);
    return stripe.paymentIntents.retrieve(
      (await stripe.checkout.sessions.retrieve(session.id)).payment_intent as string,
    );
  }

  it('when less than the hold is captured with amount_to_capture, then the intent reports that amount received and nothing left to capture', async () => {
    const intent = await hold();
    const captured = await stripe.paymentIntents.capture(intent.id, { amount_to_capture: intent.amount - 1000 });
    expect(captured).toMatchObject({
      status: 'succeeded',
      amount_received: intent.amount - 1000,
      amount_capturable: 0,
    });
  });

  it('when the clock passes capture_before, then the hold lapses to canceled (automatic) and capturing it fails', async () => {
    const intent = await hold();
    const moved = await fetch(`${fake.url}/_fake/clock`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ advanceSeconds: 7 * 86_400 }),
    });
    expect(moved.status).toBe(200);
    expect(await stripe.paymentIntents.retrieve(intent.id)).toMatchObject({
      status: 'canceled',
      cancellation_reason: 'automatic',
      amount_capturable: 0,
    });
    await expect(stripe.paymentIntents.capture(intent.id)).rejects.toMatchObject({
      code: 'payment_intent_unexpected_state',
    });
  });

  it('when a test asks the stand-in to expire one hold, then only that hold lapses', async () => {
    const [first, second] = [await hold(), await hold()];
    const expired = await fetch(`${fake.url}/_fake/payment_intents/${first.id}/expire`, { method: 'POST' });
    expect(expired.status).toBe(200);
    expect((await stripe.paymentIntents.retrieve(first.id)).status).toBe('canceled');
    expect((await stripe.paymentIntents.retrieve(second.id)).status).toBe('requires_capture');
  });
});
