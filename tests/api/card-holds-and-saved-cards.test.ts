/**
 * The studio's charge always takes the order's current total. Within the hold window the card is held and the hold
 * captured (in part when the total fell); a total above the hold, or a hold that lapsed, is charged off-session on
 * the card checkout kept; an order due after a hold would end only keeps the card; and when the bank wants the
 * customer, they are e-mailed a payment link that their order page shows too.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { checkoutStartedResponse, customerOrderResponse } from '../../server/src/contracts/orders.ts';
import { orderDetailResponse } from '../../server/src/contracts/admin-orders.ts';
import { startPaymentHarness, type PaymentHarness } from '../support/payment-stand-ins.ts';
import { signedInAgent } from '../support/api-calls.ts';
import { priyasCheckout } from '../support/checkout-bodies.ts';
import { sendTestProof } from '../support/proof-fixtures.ts';
import { approveLatestProofAsCustomer } from '../support/studio-order-support.ts';
import { fixedNow, type ApiAgent } from '../support/api-harness.ts';

// Stripe's test card that asks for authentication on every payment, however it was saved (Stripe's testing docs,
// 4000 0027 6000 3184, from memory).
const AUTHENTICATE_ALWAYS = '4000 0027 6000 3184';

function ordersAt(harness: () => PaymentHarness) {
  const h = () => harness();
  const orderRow = (number: string) => h().db('orders').where({ number }).first();
  const paymentsOf = async (number: string) =>
    h()
      .db('payments')
      .where({ order_id: (await orderRow(number)).id })
      .orderBy('id');
  const mailsOf = async (number: string, template: string) =>
    h()
      .db('email_log')
      .where({ order_id: (await orderRow(number)).id, template });
  /** Priya orders design 1 (needed by Dec 18) and pays on the payment page with `card`; the proof is then approved. */
  async function approvedOrder(priya: ApiAgent, card = '4242 4242 4242 4242') {
    const { body } = await priyasCheckout(priya);
    const order = checkoutStartedResponse.parse((await priya.post('/api/orders').send(body).expect(201)).body);
    expect(await h().pay(order.checkoutUrl, card)).toBe(303);
    await h().deliverNewEvents();
    await sendTestProof(h().db, { orderNumber: order.number, now: fixedNow() });
    await approveLatestProofAsCustomer(h().db, order.number, fixedNow());
    const row = await orderRow(order.number);
    return { number: order.number, checkoutUrl: order.checkoutUrl, totalCents: Number(row.total_cents) };
  }
  return { orderRow, paymentsOf, mailsOf, approvedOrder };
}

describe('when the work is due before the hold ends (a 30-day hold window)', () => {
  let harness: PaymentHarness;
  let studio: ApiAgent;
  let priya: ApiAgent;
  const { orderRow, paymentsOf, mailsOf, approvedOrder } = ordersAt(() => harness);
  /** A new price approved with a proof, as the orders module writes it: the subtotal and the total move together. */
  const newPrice = (number: string, changeCents: number) =>
    harness
      .db('orders')
      .where({ number })
      .update({
        subtotal_cents: harness.db.raw('subtotal_cents + ?', [changeCents]),
        total_cents: harness.db.raw('total_cents + ?', [changeCents]),
      });
  const intentOf = async (number: string) =>
    harness.stripeState.paymentIntents.get((await paymentsOf(number))[0].payment_intent_id)!;

  beforeAll(async () => {
    harness = await startPaymentHarness({ holdWindowDays: 30 });
    studio = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
    priya = await signedInAgent(harness, 'priya@example.test');
  });
  afterAll(async () => {
    await harness.close();
  });

  it('when the studio charges within the hold, then the hold is captured for the total and the customer is e-mailed', async () => {
    const order = await approvedOrder(priya);
    const [hold] = await paymentsOf(order.number);
    expect(hold).toMatchObject({ method: 'hold', status: 'authorized' });
    expect(hold.payment_method_id).not.toBeNull();
    const page = orderDetailResponse.parse((await studio.get(`/api/admin/orders/${order.number}`).expect(200)).body);
    expect(page.charge).toMatchObject({ kind: 'capture', amountCents: order.totalCents });

    const res = await studio.post(`/api/admin/orders/${order.number}/capture`).expect(200);
    expect(res.body).toMatchObject({ status: 'in_production', capturedCents: order.totalCents });
    expect(await intentOf(order.number)).toMatchObject({ status: 'succeeded', amount_received: order.totalCents });
    const [mail] = await mailsOf(order.number, 'card_charged');
    expect(mail.text_body).toContain('We have charged');
  });

  it('when the total fell below the hold, then only the total is captured and the rest of the hold is released', async () => {
    const order = await approvedOrder(priya);
    const lower = order.totalCents - 500;
    await newPrice(order.number, -500);
    const page = orderDetailResponse.parse((await studio.get(`/api/admin/orders/${order.number}`).expect(200)).body);
    expect(page.charge).toMatchObject({ kind: 'capture_less', amountCents: lower });

    const res = await studio.post(`/api/admin/orders/${order.number}/capture`).expect(200);
    expect(res.body).toMatchObject({ status: 'in_production', capturedCents: lower });
    const intent = await intentOf(order.number);
    expect(intent).toMatchObject({ status: 'succeeded', amount_received: lower, amount_capturable: 0 });
    expect(harness.stripeState.charges.get(intent.latest_charge!)!.amount_captured).toBe(lower);
    const [mail] = await mailsOf(order.number, 'card_charged');
    expect(mail.text_body).toMatch(/rest of the hold is released/);
  });

  it('when the total grew past the hold, then the hold is released and the kept card is charged the new total off-session', async () => {
    const order = await approvedOrder(priya);
    const higher = order.totalCents + 700;
    await newPrice(order.number, 700);
    const res = await studio.post(`/api/admin/orders/${order.number}/capture`).expect(200);
    expect(res.body).toMatchObject({ status: 'in_production', paymentStatus: 'captured', capturedCents: higher });
    expect(await intentOf(order.number)).toMatchObject({ status: 'canceled' });
    const payments = await paymentsOf(order.number);
    expect(payments.map((p) => [p.method, p.status])).toEqual([
      ['hold', 'voided'],
      ['off_session', 'captured'],
    ]);
    expect(harness.stripeState.paymentIntents.get(payments[1].payment_intent_id)!.amount_received).toBe(higher);
  });

  it('when the hold lapsed at the provider, then the kept card is charged off-session for the total', async () => {
    const order = await approvedOrder(priya);
    const [hold] = await paymentsOf(order.number);
    // Past the hold's capture-before: the stand-in lets it lapse as Stripe does.
    const moved = await fetch(`${harness.config.stripe.apiUrl}/_fake/clock`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ advanceSeconds: 8 * 86_400 }),
    });
    expect(moved.status).toBe(200);
    expect(harness.stripeState.paymentIntents.get(hold.payment_intent_id)).toMatchObject({
      status: 'canceled',
      cancellation_reason: 'automatic',
    });
    await harness.deliverNewEvents();
    expect((await paymentsOf(order.number))[0].status).toBe('voided');
    const page = orderDetailResponse.parse((await studio.get(`/api/admin/orders/${order.number}`).expect(200)).body);
    expect(page.charge?.kind).toBe('charge_saved_card');

    const res = await studio.post(`/api/admin/orders/${order.number}/capture`).expect(200);
    expect(res.body).toMatchObject({ status: 'in_production', capturedCents: order.totalCents });
    const charge = (await paymentsOf(order.number)).at(-1)!;
    expect(charge).toMatchObject({ method: 'off_session', status: 'captured' });
    expect(await orderRow(order.number)).toMatchObject({ payment_status: 'captured' });
  });
});

describe('when the work is due after the hold would end (the 7-day default)', () => {
  let harness: PaymentHarness;
  let studio: ApiAgent;
  let priya: ApiAgent;
  const { orderRow, paymentsOf, mailsOf, approvedOrder } = ordersAt(() => harness);
  const customerPage = async (number: string) =>
    customerOrderResponse.parse((await priya.get(`/api/orders/${number}`).expect(200)).body);

  beforeAll(async () => {
    harness = await startPaymentHarness({ holdWindowDays: 7 });
    studio = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
    priya = await signedInAgent(harness, 'priya@example.test');
  });
  afterAll(async () => {
    await harness.close();
  });

  it('when the order is due Dec 18 and a hold would end Dec 8, then the card is saved, nothing held, and charged off-session at approval', async () => {
    const order = await approvedOrder(priya);
    const sessionId = new URL(order.checkoutUrl).pathname.split('/').at(-1)!;
    expect(harness.stripeState.checkoutSessions.get(sessionId)!.session.mode).toBe('setup');
    const [saved] = await paymentsOf(order.number);
    expect(saved).toMatchObject({ method: 'saved_card', status: 'saved', amount_authorized_cents: 0 });
    expect((await customerPage(order.number)).payment).toMatchObject({ isCardSaved: true, heldCents: 0 });
    const [placed] = await mailsOf(order.number, 'order_placed');
    expect(placed.text_body).toMatch(/card is saved/);

    const res = await studio.post(`/api/admin/orders/${order.number}/capture`).expect(200);
    expect(res.body).toMatchObject({ status: 'in_production', capturedCents: order.totalCents });
    const charge = (await paymentsOf(order.number)).at(-1)!;
    expect(charge).toMatchObject({ method: 'off_session', status: 'captured' });
    expect(harness.stripeState.paymentIntents.get(charge.payment_intent_id)).toMatchObject({
      status: 'succeeded',
      amount_received: order.totalCents,
      payment_method: saved.payment_method_id,
    });
    expect(await mailsOf(order.number, 'card_charged')).toHaveLength(1);
  });

  it('when the bank asks for the customer, then nothing is charged, a payment link is e-mailed and shown, and paying on it starts production', async () => {
    const order = await approvedOrder(priya, AUTHENTICATE_ALWAYS);
    const res = await studio.post(`/api/admin/orders/${order.number}/capture`).expect(409);
    expect(res.body.error.message).toMatch(/bank wants them to confirm this payment/);
    expect(await orderRow(order.number)).toMatchObject({ status: 'proof_approved' });
    const failed = [...harness.stripeState.paymentIntents.values()].at(-1)!;
    expect(failed).toMatchObject({
      status: 'requires_payment_method',
      last_payment_error: { code: 'authentication_required' },
    });

    const link = (await paymentsOf(order.number)).at(-1)!;
    expect(link).toMatchObject({ method: 'payment_link', status: 'pending' });
    const [mail] = await mailsOf(order.number, 'payment_confirmation_needed');
    expect(mail.text_body).toContain(link.payment_page_url);
    const page = await customerPage(order.number);
    expect(page.payment.confirmPaymentUrl).toBe(link.payment_page_url);
    expect(page.payment.failureMessage).toMatch(/bank asked for you to confirm/);

    // A second click finds no kept card: it asks the customer again rather than charging.
    const studioPage = orderDetailResponse.parse(
      (await studio.get(`/api/admin/orders/${order.number}`).expect(200)).body,
    );
    expect(studioPage.charge).toBeNull();

    expect(await harness.pay(link.payment_page_url, AUTHENTICATE_ALWAYS)).toBe(303);
    await harness.deliverNewEvents();
    expect(await orderRow(order.number)).toMatchObject({ status: 'in_production', payment_status: 'captured' });
    expect((await paymentsOf(order.number)).at(-1)).toMatchObject({
      method: 'payment_link',
      status: 'captured',
      amount_captured_cents: order.totalCents,
    });
    expect(await mailsOf(order.number, 'card_charged')).toHaveLength(1);
    expect((await customerPage(order.number)).payment.confirmPaymentUrl).toBeNull();
  });
});
