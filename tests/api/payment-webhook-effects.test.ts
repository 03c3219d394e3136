import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import Stripe from 'stripe';
import { checkoutStartedResponse, customerOrderResponse } from '../../server/src/contracts/orders.ts';
import { startPaymentHarness, type PaymentHarness } from '../support/payment-stand-ins.ts';
import { signedInAgent } from '../support/api-calls.ts';
import { priyasCheckout } from '../support/checkout-bodies.ts';

let harness: PaymentHarness;
beforeAll(async () => {
  harness = await startPaymentHarness();
});
afterAll(async () => {
  await harness.close();
});

type Agent = ReturnType<PaymentHarness['agent']>;
const priya = (): Promise<Agent> => signedInAgent(harness, 'priya@example.test');

/** Priya orders her design 1 and is sent to the payment page. */
async function placeOrder(agent: Agent) {
  const { quote, body } = await priyasCheckout(agent);
  const started = checkoutStartedResponse.parse((await agent.post('/api/orders').send(body).expect(201)).body);
  return { ...started, totalCents: quote.quote.totalCents };
}

const orderRow = (number: string) => harness.db('orders').where({ number }).first();
const paymentsOf = async (number: string) =>
  harness
    .db('payments')
    .where({ order_id: (await orderRow(number)).id })
    .orderBy('id');
const detail = async (agent: Agent, number: string) =>
  customerOrderResponse.parse((await agent.get(`/api/orders/${number}`).expect(200)).body);
const lastEvent = (type: string) => harness.stripeState.events.findLast((event) => event.type === type)!;
const stripeClient = () => {
  const { hostname, port } = new URL(harness.config.stripe.apiUrl!);
  return new Stripe(harness.config.stripe.secretKey, {
    host: hostname,
    port: Number(port),
    protocol: 'http',
    maxNetworkRetries: 0,
  });
};

describe('checkout.session.completed', () => {
  it('when the card is held, then the order is placed as authorized, the hold is recorded and the order-placed e-mail goes out, once even when the event comes twice', async () => {
    const agent = await priya();
    const order = await placeOrder(agent);
    expect(await harness.pay(order.checkoutUrl)).toBe(303);
    await harness.deliverNewEvents();

    const row = await orderRow(order.number);
    expect(row).toMatchObject({ status: 'authorized', payment_status: 'authorized' });
    expect(row.placed_at).not.toBeNull();
    const [payment] = await paymentsOf(order.number);
    expect(payment).toMatchObject({
      status: 'authorized',
      amount_authorized_cents: order.totalCents,
      amount_captured_cents: 0,
      payment_intent_id: expect.stringMatching(/^pi_[A-Za-z0-9]{24}$/),
    });
    // Online card authorizations lapse after 7 days (docs.stripe.com/payments/place-a-hold-on-a-payment-method).
    expect(payment.capture_before.getTime() - payment.authorized_at.getTime()).toBeGreaterThan(6.9 * 86_400_000);
    const mails = harness.mail.filter((mail) => mail.subject === `We have your order ${order.number}`);
    expect(mails).toHaveLength(1);
    expect(mails[0].text).toMatch(/Nothing is charged until you approve the proof/);

    const again = await harness.deliver(lastEvent('checkout.session.completed')).expect(200);
    expect(again.body).toEqual({ received: true, duplicate: true });
    const events = await harness.db('order_events').where({ order_id: row.id, type: 'payment_authorized' });
    expect(events).toHaveLength(1);
    expect(harness.mail.filter((mail) => mail.subject === `We have your order ${order.number}`)).toHaveLength(1);
    const processed = await harness
      .db('payment_webhook_events')
      .where({ event_id: lastEvent('checkout.session.completed').id })
      .first();
    expect(processed.processed_at).not.toBeNull();

    const page = await detail(agent, order.number);
    expect(page.payment).toMatchObject({ heldCents: order.totalCents, chargedCents: 0, failureMessage: null });
    expect(page.actions).toEqual(['cancel']);
    expect(page.timeline.map((entry) => entry.type)).toEqual(['order_created', 'payment_authorized']);
  });

  it('when the hold has lapsed, then the order page asks to pay again, and the second hold is recorded without moving the order', async () => {
    const agent = await priya();
    const order = await placeOrder(agent);
    await harness.pay(order.checkoutUrl);
    await harness.deliverNewEvents();
    await harness
      .db('payments')
      .where({ order_id: (await orderRow(order.number)).id })
      // A hold whose card was not kept for later: with a kept card the studio would charge that instead.
      .update({ capture_before: new Date('2026-11-30T00:00:00Z'), payment_method_id: null });

    const lapsed = await detail(agent, order.number);
    expect(lapsed.actions).toContain('pay');
    expect(lapsed.payment.failureMessage).toMatch(/hold on your card ran out/);
    const retry = checkoutStartedResponse.parse(
      (await agent.post(`/api/orders/${order.number}/payment`).expect(201)).body,
    );
    await harness.pay(retry.checkoutUrl);
    await harness.deliverNewEvents();

    expect(await orderRow(order.number)).toMatchObject({ status: 'authorized', payment_status: 'authorized' });
    expect((await paymentsOf(order.number)).map((p) => p.status)).toEqual(['authorized', 'authorized']);
    const held = await detail(agent, order.number);
    expect(held.actions).not.toContain('pay');
    expect(held.timeline.filter((entry) => entry.type === 'payment_authorized')).toHaveLength(2);
  });
});

describe('declined and abandoned payments', () => {
  it('when the card is declined, then nothing is charged, the order waits for payment and the page offers another card', async () => {
    const agent = await priya();
    const order = await placeOrder(agent);
    const intentsBefore = harness.stripeState.paymentIntents.size;
    expect(await harness.pay(order.checkoutUrl, '4000 0000 0000 0002')).toBe(402);
    expect(harness.stripeState.paymentIntents.size).toBe(intentsBefore);
    await harness.deliverNewEvents();

    // The stand-in announces the decline as Stripe does; a second delivery of it changes nothing.
    await harness.deliver(lastEvent('payment_intent.payment_failed')).expect(200);

    expect(await orderRow(order.number)).toMatchObject({ status: 'awaiting_payment', payment_status: 'none' });
    const [payment] = await paymentsOf(order.number);
    expect(payment).toMatchObject({ status: 'failed', amount_authorized_cents: 0, amount_captured_cents: 0 });
    const page = await detail(agent, order.number);
    expect(page.payment).toMatchObject({ heldCents: 0, chargedCents: 0, failureMessage: 'Your card was declined.' });
    expect(page.actions).toEqual(['pay', 'cancel']);
    expect(page.timeline.filter((entry) => entry.type === 'payment_failed')).toHaveLength(1);

    const retry = checkoutStartedResponse.parse(
      (await agent.post(`/api/orders/${order.number}/payment`).expect(201)).body,
    );
    expect(retry.checkoutUrl).not.toBe(order.checkoutUrl);
  });

  it('when a declined card is followed by a good one on the same page, then the order is placed after all', async () => {
    const agent = await priya();
    const order = await placeOrder(agent);
    await harness.pay(order.checkoutUrl, '4000 0000 0000 0002');
    await harness.deliverNewEvents();
    expect((await paymentsOf(order.number))[0].status).toBe('failed');
    await harness.pay(order.checkoutUrl);
    await harness.deliverNewEvents();
    expect(await orderRow(order.number)).toMatchObject({ status: 'authorized', payment_status: 'authorized' });
    expect((await detail(agent, order.number)).payment.failureMessage).toBeNull();
  });

  it('when the order was cancelled while its payment page was open, then the hold that arrives is released at once', async () => {
    const agent = await priya();
    const order = await placeOrder(agent);
    await agent.post(`/api/orders/${order.number}/cancel`).expect(200);
    await harness.pay(order.checkoutUrl);
    await harness.deliverNewEvents();
    const [payment] = await paymentsOf(order.number);
    expect(payment.status).toBe('voided');
    expect(harness.stripeState.paymentIntents.get(payment.payment_intent_id)!.status).toBe('canceled');
    expect(await orderRow(order.number)).toMatchObject({ status: 'cancelled', payment_status: 'voided' });
  });

  it('when the payment page expires, then that attempt is failed and the order still waits for payment', async () => {
    const agent = await priya();
    const order = await placeOrder(agent);
    const [payment] = await paymentsOf(order.number);
    await harness
      .deliver({
        id: `evt_expired_${payment.id}`,
        object: 'event',
        type: 'checkout.session.expired',
        data: { object: { id: payment.checkout_session_id, object: 'checkout.session', metadata: {} } },
      })
      .expect(200);
    expect((await paymentsOf(order.number))[0].status).toBe('failed');
    expect((await detail(agent, order.number)).payment.failureMessage).toMatch(/left open too long/);
  });

  it('when a held order already paid tries to pay again, then it is 409', async () => {
    const agent = await priya();
    const order = await placeOrder(agent);
    await harness.pay(order.checkoutUrl);
    await harness.deliverNewEvents();
    await agent.post(`/api/orders/${order.number}/payment`).expect(409);
  });
});

describe('events after the studio acts', () => {
  it('when the studio captures and refunds through the provider, then the events bring the payment row in line, and a replay changes nothing', async () => {
    const agent = await priya();
    const order = await placeOrder(agent);
    await harness.pay(order.checkoutUrl);
    await harness.deliverNewEvents();
    const [held] = await paymentsOf(order.number);
    const stripe = stripeClient();
    await stripe.paymentIntents.capture(held.payment_intent_id);
    await stripe.refunds.create({ payment_intent: held.payment_intent_id, amount: 500 });
    await harness.deliverNewEvents();

    const [payment] = await paymentsOf(order.number);
    expect(payment).toMatchObject({
      status: 'partially_refunded',
      amount_captured_cents: order.totalCents,
      amount_refunded_cents: 500,
    });
    expect((await orderRow(order.number)).payment_status).toBe('partially_refunded');
    await harness.deliver({ ...lastEvent('payment_intent.succeeded'), id: 'evt_replayed_capture' }).expect(200);
    expect((await paymentsOf(order.number))[0]).toMatchObject({
      status: 'partially_refunded',
      amount_refunded_cents: 500,
    });
  });

  it('when the customer cancels with a card held, then the hold is released at the provider, and its cancelled event is a no-op', async () => {
    const agent = await priya();
    const order = await placeOrder(agent);
    await harness.pay(order.checkoutUrl);
    await harness.deliverNewEvents();
    await agent.post(`/api/orders/${order.number}/cancel`).expect(200);
    const [payment] = await paymentsOf(order.number);
    expect(payment.status).toBe('voided');
    expect(harness.stripeState.paymentIntents.get(payment.payment_intent_id)!.status).toBe('canceled');
    await harness.deliverNewEvents();
    expect(await orderRow(order.number)).toMatchObject({ status: 'cancelled', payment_status: 'voided' });
    expect(
      harness.mail.some(
        (mail) =>
          mail.subject === `${order.number} has been cancelled` && /hold on your card is released/.test(mail.text),
      ),
    ).toBe(true);
    await agent.post(`/api/orders/${order.number}/cancel`).expect(409);
  });
});
