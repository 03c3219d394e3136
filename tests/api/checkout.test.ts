import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { storedQuoteResponse } from '../../server/src/contracts/stored-quotes.ts';
import { checkoutStartedResponse, type PlaceOrderRequest } from '../../server/src/contracts/orders.ts';
import { savedDesignResponse } from '../../server/src/contracts/saved-designs.ts';
import { startPaymentHarness, type PaymentHarness } from '../support/payment-stand-ins.ts';
import { signedInAgent } from '../support/api-calls.ts';

let harness: PaymentHarness;
beforeAll(async () => {
  harness = await startPaymentHarness();
});
afterAll(async () => {
  await harness.close();
});

type Agent = ReturnType<PaymentHarness['agent']>;

const priya = 'priya@example.test';
const harriet = 'harriet@example.test';
const shipTo = {
  name: 'Priya Castellanos',
  line1: '48 Larkspur Lane',
  city: 'Fernhollow',
  region: 'OR',
  postalCode: '97000',
  countryCode: 'us',
};

const signedIn = (email: string): Promise<Agent> => signedInAgent(harness, email);

/** Priya's seeded design 1 (a bishop dress with a daisy border and a name), as the quote request for it. */
async function designQuoteBody(agent: Agent, designId = 1, changes: { quantity?: number; isRush?: boolean } = {}) {
  const { design } = savedDesignResponse.parse((await agent.get(`/api/designs/${designId}`).expect(200)).body);
  return {
    garmentId: design.garmentId,
    sizeId: design.sizeId,
    colourId: design.colourId,
    quantity: changes.quantity ?? 1,
    isRush: changes.isRush ?? false,
    document: design.document,
    designId,
  };
}

async function storedQuote(agent: Agent, changes: { quantity?: number; isRush?: boolean } = {}) {
  return storedQuoteResponse.parse(
    (
      await agent
        .post('/api/quotes')
        .send(await designQuoteBody(agent, 1, changes))
        .expect(201)
    ).body,
  );
}

// The harness clock reads Tuesday 2026-12-01 10:00 UTC, 04:00 in the shop's America/Chicago. The seeded lead time is
// 10 working days (Mon–Fri), so a regular order can be ready on Tuesday 15 December and a rush (half) on the 8th.
const regularDate = '2026-12-18';
const rushOnlyDate = '2026-12-10';

const orderBody = (quoteId: number, overrides: Partial<PlaceOrderRequest> = {}) => ({
  quoteId,
  designId: 1,
  neededBy: regularDate,
  shipTo,
  note: 'For a christening on the 20th.',
  ...overrides,
});

describe('POST /api/quotes', () => {
  it('when a visitor prices a design, then the quote is stored for 14 days with the ready dates, and their session can open it again', async () => {
    const visitor = harness.agent();
    const { designId: _ignored, ...body } = await designQuoteBody(await signedIn(priya));
    const res = await visitor.post('/api/quotes').send(body).expect(201);
    const quote = storedQuoteResponse.parse(res.body);
    expect(quote.expiresAt).toBe('2026-12-15T10:00:00.000Z');
    expect(quote.readyDates).toEqual({
      leadTimeDays: 10,
      earliestReadyDate: '2026-12-15',
      earliestRushDate: '2026-12-08',
    });
    expect(quote.quote.lines.reduce((sum, line) => sum + line.amountCents, 0)).toBe(quote.quote.totalCents);

    const row = await harness.db('quotes').where({ id: quote.quoteId }).first();
    expect(row).toMatchObject({
      customer_id: null,
      design_id: null,
      quantity: 1,
      total_cents: quote.quote.totalCents,
      stitch_count: expect.any(Number),
    });
    expect(row.hooping_count).toBeGreaterThanOrEqual(4);

    const again = storedQuoteResponse.parse((await visitor.get(`/api/quotes/${quote.quoteId}`).expect(200)).body);
    expect(again.quote).toEqual(quote.quote);
    await harness.agent().get(`/api/quotes/${quote.quoteId}`).expect(404);
  });

  it('when a customer prices their own saved design for three, then the quote is theirs and only they can open it', async () => {
    const agent = await signedIn(priya);
    const quote = await storedQuote(agent, { quantity: 3 });
    expect(quote).toMatchObject({ designId: 1, quantity: 3, isRush: false });
    await agent.get(`/api/quotes/${quote.quoteId}`).expect(200);
    await (await signedIn(harriet)).get(`/api/quotes/${quote.quoteId}`).expect(404);
  });

  it('when the design named is someone else’s, then it is 404, and signed out it asks to sign in', async () => {
    const body = await designQuoteBody(await signedIn(priya));
    const res = await (await signedIn(harriet)).post('/api/quotes').send(body).expect(404);
    expect(res.body.error.fields).toEqual({ designId: 'Choose one of your saved designs' });
    await harness.agent().post('/api/quotes').send(body).expect(401);
  });

  it('when the body carries a price of its own or a bad quantity, then it is 400 with the fields to fix', async () => {
    const body = await designQuoteBody(await signedIn(priya));
    const res = await harness
      .agent()
      .post('/api/quotes')
      .send({ ...body, quantity: 0, totalCents: 1 })
      .expect(400);
    expect(res.body.error.fields).toMatchObject({ '(request)': expect.stringMatching(/Leave out totalCents/) });
    const bad = await harness
      .agent()
      .post('/api/quotes')
      .send({ ...body, designId: undefined, quantity: 0 })
      .expect(400);
    expect(bad.body.error.fields).toEqual({ quantity: 'Order at least 1 garment' });
  });
});

describe('POST /api/orders', () => {
  it('when signed out, then it is 401', async () => {
    await harness.agent().post('/api/orders').send(orderBody(1)).expect(401);
  });

  it('when the address and date are missing or wrong, then it is 400 with a message beside each field', async () => {
    const agent = await signedIn(priya);
    const res = await agent
      .post('/api/orders')
      .send({
        quoteId: 1,
        designId: 1,
        neededBy: '2026-02-30',
        shipTo: { ...shipTo, line1: ' ', postalCode: '!', countryCode: 'USA' },
      })
      .expect(400);
    expect(res.body.error.fields).toEqual({
      neededBy: 'Choose a real date',
      'shipTo.line1': 'Enter the street address',
      'shipTo.postalCode': 'Enter the postal code',
      'shipTo.countryCode': 'Choose the country',
    });
  });

  it('when a customer orders from their quote, then the order waits for payment with the quote’s totals and the card page holds (not charges) that total', async () => {
    const agent = await signedIn(priya);
    const quote = await storedQuote(agent);
    const res = await agent.post('/api/orders').send(orderBody(quote.quoteId)).expect(201);
    const started = checkoutStartedResponse.parse(res.body);
    expect(started.number).toMatch(/^WB-\d{4}$/);
    expect(Number(started.number.slice(3))).toBeGreaterThan(1012);

    const order = await harness.db('orders').where({ number: started.number }).first();
    expect(order).toMatchObject({
      status: 'awaiting_payment',
      payment_status: 'none',
      quote_id: quote.quoteId,
      total_cents: quote.quote.totalCents,
      placed_at: null,
      customer_note: 'For a christening on the 20th.',
    });
    expect(order.ship_to).toMatchObject({ countryCode: 'US', postalCode: '97000' });
    const item = await harness.db('order_items').where({ order_id: order.id }).first();
    expect(item).toMatchObject({ design_id: 1, quantity: 1, total_cents: quote.quote.subtotalCents });
    const payment = await harness.db('payments').where({ order_id: order.id }).first();
    expect(payment).toMatchObject({
      status: 'pending',
      amount_authorized_cents: 0,
      checkout_session_id: expect.stringMatching(/^cs_test_/),
    });

    const session = harness.stripeState.checkoutSessions.get(payment.checkout_session_id)!;
    expect(started.checkoutUrl).toBe(session.session.url);
    expect(session.paymentIntentData.captureMethod).toBe('manual');
    expect(session.session.amount_total).toBe(quote.quote.totalCents);
    expect(session.session.metadata).toMatchObject({ orderId: String(order.id), orderNumber: started.number });
    expect(session.session.success_url).toBe(`${harness.config.appOrigin}/orders/${started.number}?checkout=done`);
    expect(session.session.cancel_url).toBe(`${harness.config.appOrigin}/orders/${started.number}?checkout=cancelled`);
  });

  it('when the quote has expired, then it is 409 with the old and new totals and a new quote, which then orders', async () => {
    const agent = await signedIn(priya);
    const quote = await storedQuote(agent);
    await harness
      .db('quotes')
      .where({ id: quote.quoteId })
      .update({
        expires_at: new Date('2026-11-30T00:00:00Z'),
        total_cents: quote.quote.totalCents + 500,
        subtotal_cents: quote.quote.subtotalCents + 500,
      });
    const res = await agent.post('/api/orders').send(orderBody(quote.quoteId)).expect(409);
    expect(res.body.error.message).toMatch(/worked out again with today's prices/);
    const details = res.body.error.details;
    expect(details).toMatchObject({
      reason: 'quote-expired',
      previousTotalCents: quote.quote.totalCents + 500,
      totalCents: quote.quote.totalCents,
      currency: 'USD',
    });
    expect(details.quoteId).toBeGreaterThan(quote.quoteId);
    await agent.post('/api/orders').send(orderBody(details.quoteId)).expect(201);
  });

  it('when the date needed is inside the lead time, then it is 409 offering a rush quote, and too soon even for rush is refused on the date', async () => {
    const agent = await signedIn(priya);
    const quote = await storedQuote(agent);
    const res = await agent
      .post('/api/orders')
      .send(orderBody(quote.quoteId, { neededBy: rushOnlyDate }))
      .expect(409);
    const details = res.body.error.details;
    expect(details).toMatchObject({
      reason: 'rush-needed',
      isRush: true,
      previousTotalCents: quote.quote.totalCents,
      earliestReadyDate: '2026-12-15',
    });
    expect(details.totalCents).toBeGreaterThan(quote.quote.totalCents);
    const rushQuote = storedQuoteResponse.parse((await agent.get(`/api/quotes/${details.quoteId}`).expect(200)).body);
    expect(rushQuote.quote.lines.map((line) => line.code)).toContain('rush');
    await agent
      .post('/api/orders')
      .send(orderBody(details.quoteId, { neededBy: rushOnlyDate }))
      .expect(201);

    const tooSoon = await agent
      .post('/api/orders')
      .send(orderBody(details.quoteId, { neededBy: '2026-12-03' }))
      .expect(409);
    expect(tooSoon.body.error.fields.neededBy).toMatch(/earliest is 2026-12-08/);
    const past = await agent
      .post('/api/orders')
      .send(orderBody(details.quoteId, { neededBy: '2026-11-20' }))
      .expect(400);
    expect(past.body.error.fields).toEqual({ neededBy: 'Choose a date from today on' });
  });

  it('when the quote or design is someone else’s, or the quote priced another design, then nothing is ordered', async () => {
    const agent = await signedIn(priya);
    const quote = await storedQuote(agent);
    await (await signedIn(harriet)).post('/api/orders').send(orderBody(quote.quoteId)).expect(404);
    await agent
      .post('/api/orders')
      .send(orderBody(quote.quoteId, { designId: 5 }))
      .expect(404);
    const other = await agent
      .post('/api/orders')
      .send(orderBody(quote.quoteId, { designId: 2 }))
      .expect(409);
    expect(other.body.error.message).toMatch(/another version of the design/);
  });
});
