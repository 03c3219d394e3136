import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { startStripeFake } from '../../../fakes/stripe/server.ts';
import {
  API_KEY,
  FIXED_NOW_MS,
  WEBHOOK_SECRET,
  orderSeven,
  startWebhookReceiver,
  stripeClientFor,
  submitPaymentForm,
} from './stripe-fake-helpers.ts';

// Authorize now, capture later with capture_method=manual; status requires_capture until captured
// (docs.stripe.com/payments/place-a-hold-on-a-payment-method, via ../shared/reference/trade-facts.md).
let receiver: Awaited<ReturnType<typeof startWebhookReceiver>>;
let fake: Awaited<ReturnType<typeof startStripeFake>>;
let stripe: Stripe;

beforeAll(async () => {
  receiver = await startWebhookReceiver({ secret: WEBHOOK_SECRET, nowMs: () => FIXED_NOW_MS });
  fake = await startStripeFake({
    port: 0,
    apiKey: API_KEY,
    webhookSecret: WEBHOOK_SECRET,
    webhookUrl: receiver.url,
    now: () => FIXED_NOW_MS,
  });
  stripe = stripeClientFor(fake.url);
});
afterAll(async () => {
  await fake.close();
  await receiver.close();
});

async function paidSession(params: Stripe.Checkout.SessionCreateParams = orderSeven) {
  const session = await stripe.checkout.sessions.create(params);
  const paid = await submitPaymentForm(session.url!);
  expect(paid.status).toBe(303);
  return stripe.checkout.sessions.retrieve(session.id, { expand: ['payment_intent'] });
}

const settled = () => fake.state.deliveries.every((delivery) => delivery.status !== 'pending');

describe('Checkout with manual capture through the official SDK', () => {
  it('when the session is paid, captured and refunded, then every step and webhook matches Stripe', async () => {
    const session = await stripe.checkout.sessions.create(orderSeven);
    expect(session).toMatchObject({
      // Id shapes as Stripe's API reference shows them (a prefix, then letters and digits), from memory.
      id: expect.stringMatching(/^cs_test_[A-Za-z0-9]{58}$/),
      object: 'checkout.session',
      url: `${fake.url}/pay/${session.id}`,
      amount_total: 6400,
      currency: 'usd',
      status: 'open',
      payment_status: 'unpaid',
      payment_intent: null,
      client_reference_id: 'order-7',
      metadata: { orderId: '7' },
      created: FIXED_NOW_MS / 1000,
    });

    const page = await (await fetch(session.url!)).text();
    expect(page).toContain('Local test payment page — no real money moves');
    expect(page).toContain('Smocked romper, size 2T × 2');
    expect(page).toContain('$64.00');

    const paid = await submitPaymentForm(session.url!);
    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toBe(`http://127.0.0.1:3999/checkout/done?session=${session.id}`);

    const completed = await stripe.checkout.sessions.retrieve(session.id, { expand: ['payment_intent'] });
    const intent = completed.payment_intent as Stripe.PaymentIntent;
    expect(completed).toMatchObject({ status: 'complete', payment_status: 'unpaid', url: null });
    expect(intent).toMatchObject({
      id: expect.stringMatching(/^pi_[A-Za-z0-9]{24}$/),
      object: 'payment_intent',
      status: 'requires_capture',
      amount: 6400,
      amount_capturable: 6400,
      currency: 'usd',
      metadata: { orderId: '7' },
      latest_charge: expect.stringMatching(/^ch_[A-Za-z0-9]{24}$/),
    });
    expect((await stripe.paymentIntents.retrieve(intent.id)).status).toBe('requires_capture');

    const captured = await stripe.paymentIntents.capture(intent.id, { amount_to_capture: 5000 });
    expect(captured).toMatchObject({ status: 'succeeded', amount_received: 5000, amount_capturable: 0 });
    const again = await stripe.paymentIntents.capture(intent.id).catch((error: unknown) => error);
    expect(again).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(again).toMatchObject({
      statusCode: 400,
      type: 'StripeInvalidRequestError',
      code: 'payment_intent_unexpected_state',
    });

    const partial = await stripe.refunds.create({ payment_intent: intent.id, amount: 2000 });
    expect(partial).toMatchObject({
      id: expect.stringMatching(/^re_[A-Za-z0-9]{24}$/),
      object: 'refund',
      status: 'succeeded',
      amount: 2000,
      charge: intent.latest_charge,
    });
    const tooMuch = await stripe.refunds
      .create({ payment_intent: intent.id, amount: 3001 })
      .catch((error: unknown) => error);
    expect(tooMuch).toMatchObject({ statusCode: 400, code: 'amount_too_large' });
    expect((await stripe.refunds.create({ payment_intent: intent.id })).amount).toBe(3000);

    await vi.waitFor(() => expect(receiver.events).toHaveLength(5), { timeout: 5_000 });
    expect(receiver.rejections).toEqual([]);
    expect(receiver.events.map((event) => event.type)).toEqual([
      'checkout.session.completed',
      'payment_intent.amount_capturable_updated',
      'payment_intent.succeeded',
      'charge.refunded',
      'charge.refunded',
    ]);
    const [completedEvent, , , firstRefund, lastRefund] = receiver.events;
    expect(completedEvent).toMatchObject({ object: 'event', api_version: '2026-10-28.endive', livemode: false });
    expect(completedEvent.data.object).toMatchObject({ id: session.id, payment_intent: intent.id, status: 'complete' });
    expect(firstRefund.data.object).toMatchObject({ amount_captured: 5000, amount_refunded: 2000, refunded: false });
    expect(lastRefund.data.object).toMatchObject({ amount_refunded: 5000, refunded: true });
    expect(fake.state.deliveries.map(({ status, statusCode, attempts }) => ({ status, statusCode, attempts }))).toEqual(
      Array(5).fill({ status: 'delivered', statusCode: 200, attempts: 1 }),
    );
  });

  it('when an authorized payment is cancelled, then the hold is released and capture is refused', async () => {
    const intent = (await paidSession()).payment_intent as Stripe.PaymentIntent;
    const cancelled = await stripe.paymentIntents.cancel(intent.id, { cancellation_reason: 'requested_by_customer' });
    expect(cancelled).toMatchObject({
      status: 'canceled',
      amount_capturable: 0,
      cancellation_reason: 'requested_by_customer',
    });
    const capture = await stripe.paymentIntents.capture(intent.id).catch((error: unknown) => error);
    expect(capture).toMatchObject({ statusCode: 400, code: 'payment_intent_unexpected_state' });
    const refund = await stripe.refunds.create({ payment_intent: intent.id }).catch((error: unknown) => error);
    expect(refund).toMatchObject({ statusCode: 400, code: 'charge_not_refundable' });
    await vi.waitFor(() => expect(settled()).toBe(true));
    expect(receiver.events.at(-1)).toMatchObject({
      type: 'payment_intent.canceled',
      data: { object: { id: intent.id } },
    });
  });

  it('when the session uses automatic capture, then payment succeeds at once', async () => {
    const { payment_intent_data: _manual, ...automatic } = orderSeven;
    const session = await paidSession(automatic);
    expect(session.payment_status).toBe('paid');
    expect(session.payment_intent).toMatchObject({
      status: 'succeeded',
      amount_received: 6400,
      capture_method: 'automatic',
    });
    await vi.waitFor(() => expect(settled()).toBe(true));
    expect(receiver.events.at(-1)?.type).toBe('payment_intent.succeeded');
  });
});

describe('the API edges', () => {
  it('when the API key is wrong, then the SDK raises an authentication error', async () => {
    const error = await stripeClientFor(fake.url, 'sk_test_someone_else_entirely')
      .paymentIntents.retrieve('pi_3RandomLooking0000000000')
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    expect(error).toMatchObject({ statusCode: 401 });
  });

  it('when an id is unknown, then it answers 404 resource_missing', async () => {
    const error = await stripe.paymentIntents.retrieve('pi_test_999999').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(error).toMatchObject({
      statusCode: 404,
      code: 'resource_missing',
      message: "No such payment_intent: 'pi_test_999999'",
    });
  });

  it('when a required parameter is missing or malformed, then it names the param in bracket notation', async () => {
    const { line_items: _items, ...withoutItems } = orderSeven;
    const missing = await stripe.checkout.sessions.create(withoutItems).catch((e: unknown) => e);
    expect(missing).toMatchObject({ statusCode: 400, code: 'parameter_missing', param: 'line_items' });
    const { mode: _mode, ...withoutMode } = orderSeven;
    const noMode = await stripe.checkout.sessions.create(withoutMode).catch((e: unknown) => e);
    expect(noMode).toMatchObject({ statusCode: 400, code: 'parameter_missing', param: 'mode' });
    const badAmount = await stripe.checkout.sessions
      .create({ ...orderSeven, line_items: [{ ...orderSeven.line_items[0], quantity: 0 }] })
      .catch((e: unknown) => e);
    expect(badAmount).toMatchObject({ statusCode: 400, param: 'line_items[0][quantity]' });
    const { id: sessionId } = await stripe.checkout.sessions.create(orderSeven);
    const badExpand = await stripe.checkout.sessions
      .retrieve(sessionId, { expand: ['customer'] })
      .catch((e: unknown) => e);
    expect(badExpand).toMatchObject({ statusCode: 400, param: 'expand' });
  });

  it('when a POST repeats its Idempotency-Key, then the first answer is replayed; other params are refused', async () => {
    const before = fake.state.checkoutSessions.size;
    const first = await stripe.checkout.sessions.create(orderSeven, { idempotencyKey: 'order-7-attempt-1' });
    const second = await stripe.checkout.sessions.create(orderSeven, { idempotencyKey: 'order-7-attempt-1' });
    expect(second.id).toBe(first.id);
    expect(fake.state.checkoutSessions.size).toBe(before + 1);
    const changed = await stripe.checkout.sessions
      .create({ ...orderSeven, client_reference_id: 'order-8' }, { idempotencyKey: 'order-7-attempt-1' })
      .catch((e: unknown) => e);
    expect(changed).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
  });
});
