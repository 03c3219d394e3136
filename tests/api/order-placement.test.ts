import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { checkoutStartedResponse } from '../../server/src/contracts/orders.ts';
import { startPaymentHarness, type PaymentHarness } from '../support/payment-stand-ins.ts';
import { errorOf, signedInAgent } from '../support/api-calls.ts';
import { priyasCheckout } from '../support/checkout-bodies.ts';

let harness: PaymentHarness;
beforeAll(async () => {
  harness = await startPaymentHarness();
});
afterAll(async () => {
  await harness.close();
});
afterEach(() => {
  vi.restoreAllMocks();
});

type Agent = ReturnType<PaymentHarness['agent']>;

const checkoutBody = async (agent: Agent) => (await priyasCheckout(agent)).body;

const ordersOfQuote = async (quoteId: number) => harness.db('orders').where({ quote_id: quoteId }).select('*');

describe('POST /api/orders, sent more than once', () => {
  it('when the same checkout is sent twice, then there is one order and the second answer is the first one’s', async () => {
    const agent = await signedInAgent(harness, 'priya@example.test');
    const body = await checkoutBody(agent);
    const first = checkoutStartedResponse.parse((await agent.post('/api/orders').send(body).expect(201)).body);
    const second = checkoutStartedResponse.parse((await agent.post('/api/orders').send(body).expect(201)).body);
    expect(second).toEqual(first);
    expect(await ordersOfQuote(body.quoteId)).toHaveLength(1);
    const [order] = await ordersOfQuote(body.quoteId);
    expect(await harness.db('payments').where({ order_id: order.id })).toHaveLength(1);
  });

  it('when three identical checkouts arrive in parallel, then one order is made and all three answer with it', async () => {
    const agent = await signedInAgent(harness, 'priya@example.test');
    const body = await checkoutBody(agent);
    const answers = await Promise.all([1, 2, 3].map(() => agent.post('/api/orders').send(body)));
    expect(answers.map((res) => res.status)).toEqual([201, 201, 201]);
    const started = answers.map((res) => checkoutStartedResponse.parse(res.body));
    expect(new Set(started.map((s) => s.number)).size).toBe(1);
    expect(new Set(started.map((s) => s.checkoutUrl)).size).toBe(1);
    expect(await ordersOfQuote(body.quoteId)).toHaveLength(1);
  });

  it('when the order from that quote was cancelled, then sending it again answers 409 and orders nothing', async () => {
    const agent = await signedInAgent(harness, 'priya@example.test');
    const body = await checkoutBody(agent);
    const { number } = checkoutStartedResponse.parse((await agent.post('/api/orders').send(body).expect(201)).body);
    await agent.post(`/api/orders/${number}/cancel`).expect(200);
    const again = await agent.post('/api/orders').send(body).expect(409);
    expect(errorOf(again.body).message).toMatch(/cancelled\. Price the design again/);
    expect(await ordersOfQuote(body.quoteId)).toHaveLength(1);
  });
});

describe('POST /api/orders, when the payment page cannot be opened', () => {
  it('when the payment provider fails after the order is made, then it still answers 201 with the order, and the same checkout again opens its payment page', async () => {
    const agent = await signedInAgent(harness, 'priya@example.test');
    const body = await checkoutBody(agent);
    vi.spyOn(harness.stripe.checkout.sessions, 'create').mockRejectedValueOnce(new Error('The provider is away.'));
    const first = checkoutStartedResponse.parse((await agent.post('/api/orders').send(body).expect(201)).body);
    expect(first.checkoutUrl).toBe(`${harness.config.appOrigin}/orders/${first.number}`);
    const [order] = await ordersOfQuote(body.quoteId);
    expect(order).toMatchObject({ number: first.number, status: 'awaiting_payment' });

    const retry = checkoutStartedResponse.parse((await agent.post('/api/orders').send(body).expect(201)).body);
    expect(retry.number).toBe(first.number);
    const payments = await harness.db('payments').where({ order_id: order.id }).orderBy('id');
    const opened = payments.find((payment) => payment.checkout_session_id);
    expect(opened).toBeDefined();
    expect(retry.checkoutUrl).toBe(harness.stripeState.checkoutSessions.get(opened.checkout_session_id)!.session.url);
    expect(await ordersOfQuote(body.quoteId)).toHaveLength(1);
  });

  it('when the customer has paid and sends the checkout again, then it answers 201 with the order’s own page', async () => {
    const agent = await signedInAgent(harness, 'priya@example.test');
    const body = await checkoutBody(agent);
    const first = checkoutStartedResponse.parse((await agent.post('/api/orders').send(body).expect(201)).body);
    expect(await harness.pay(first.checkoutUrl)).toBe(303);
    await harness.deliverNewEvents();
    const again = checkoutStartedResponse.parse((await agent.post('/api/orders').send(body).expect(201)).body);
    expect(again).toEqual({ number: first.number, checkoutUrl: `${harness.config.appOrigin}/orders/${first.number}` });
  });
});
