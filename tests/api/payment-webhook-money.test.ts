/**
 * Money events the app did not cause: a refund reported for a hold that was never captured, a refund larger than
 * what was captured, and a capture made outside the app (the provider's dashboard). Each must leave the order where
 * the app's own money moves would.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { checkoutStartedResponse } from '../../server/src/contracts/orders.ts';
import { startPaymentHarness, type PaymentHarness } from '../support/payment-stand-ins.ts';
import { signedInAgent } from '../support/api-calls.ts';
import { priyasCheckout } from '../support/checkout-bodies.ts';
import { sendTestProof } from '../support/proof-fixtures.ts';
import { approveLatestProofAsCustomer, stripeAt } from '../support/studio-order-support.ts';
import { fixedNow, type ApiAgent } from '../support/api-harness.ts';

let harness: PaymentHarness;
let studio: ApiAgent;
beforeAll(async () => {
  harness = await startPaymentHarness();
  studio = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
});
afterAll(async () => {
  await harness.close();
});

const provider = () => stripeAt(harness.config.stripe.apiUrl!, harness.config.stripe.secretKey);
const orderRow = (number: string) => harness.db('orders').where({ number }).first();
const paymentOf = async (number: string) =>
  harness
    .db('payments')
    .where({ order_id: (await orderRow(number)).id })
    .orderBy('id', 'desc')
    .first();

/** Priya orders design 1 and pays: the card is held. */
async function heldOrder() {
  const agent = await signedInAgent(harness, 'priya@example.test');
  const { body } = await priyasCheckout(agent);
  const order = checkoutStartedResponse.parse((await agent.post('/api/orders').send(body).expect(201)).body);
  await harness.pay(order.checkoutUrl);
  await harness.deliverNewEvents();
  const payment = await paymentOf(order.number);
  return {
    number: order.number,
    paymentIntentId: payment.payment_intent_id as string,
    total: payment.amount_authorized_cents as number,
  };
}

async function approveProof(number: string) {
  await sendTestProof(harness.db, { orderNumber: number, now: fixedNow() });
  await approveLatestProofAsCustomer(harness.db, number, fixedNow());
}

/** A charge.refunded event as the provider would send it, for an amount refunded on the PaymentIntent's charge. */
const chargeRefunded = (id: string, paymentIntentId: string, amountRefunded: number) => ({
  id,
  object: 'event',
  type: 'charge.refunded',
  data: {
    object: { id: `ch_${id}`, object: 'charge', payment_intent: paymentIntentId, amount_refunded: amountRefunded },
  },
});

describe('charge.refunded', () => {
  it('when a refund arrives for a hold that was never captured, then it is recorded and ignored, and the studio can still charge the order', async () => {
    const order = await heldOrder();
    await harness.deliver(chargeRefunded('evt_refund_uncaptured', order.paymentIntentId, order.total)).expect(200);
    expect(await paymentOf(order.number)).toMatchObject({ status: 'authorized', amount_refunded_cents: 0 });
    expect(await orderRow(order.number)).toMatchObject({ status: 'authorized', payment_status: 'authorized' });
    expect(await harness.db('payment_webhook_events').where({ event_id: 'evt_refund_uncaptured' })).toHaveLength(1);

    await approveProof(order.number);
    await studio.post(`/api/admin/orders/${order.number}/capture`).expect(200);
    expect(await orderRow(order.number)).toMatchObject({ status: 'in_production', payment_status: 'captured' });
  });

  it('when a refund reports more than was captured, then only what was captured counts as refunded', async () => {
    const order = await heldOrder();
    await approveProof(order.number);
    await studio.post(`/api/admin/orders/${order.number}/capture`).expect(200);
    await harness
      .deliver(chargeRefunded('evt_refund_too_much', order.paymentIntentId, order.total + 10_000))
      .expect(200);
    expect(await paymentOf(order.number)).toMatchObject({
      status: 'refunded',
      amount_captured_cents: order.total,
      amount_refunded_cents: order.total,
    });
  });
});

describe('payment_intent.succeeded for a capture made outside the app', () => {
  it('when the proof is approved and the card is captured at the provider, then the order goes into production as the studio’s own charge would take it', async () => {
    const order = await heldOrder();
    await approveProof(order.number);
    await provider().paymentIntents.capture(order.paymentIntentId);
    await harness.deliverNewEvents();

    expect(await orderRow(order.number)).toMatchObject({ status: 'in_production', payment_status: 'captured' });
    expect(await paymentOf(order.number)).toMatchObject({ status: 'captured', amount_captured_cents: order.total });
    const moves = await harness
      .db('order_events')
      .where({ order_id: (await orderRow(order.number)).id, type: 'payment_captured' });
    expect(moves).toMatchObject([{ from_status: 'proof_approved', to_status: 'in_production', actor_user_id: null }]);
    const again = await studio.post(`/api/admin/orders/${order.number}/capture`).expect(409);
    expect(again.body.error.message).toMatch(/already been charged/);
  });

  it('when the card is captured at the provider before the proof is approved, then the order waits for the approval and the studio’s charge then starts production without charging again', async () => {
    const order = await heldOrder();
    await provider().paymentIntents.capture(order.paymentIntentId);
    await harness.deliverNewEvents();
    expect(await orderRow(order.number)).toMatchObject({ status: 'authorized', payment_status: 'captured' });

    await approveProof(order.number);
    const charged = await studio.post(`/api/admin/orders/${order.number}/capture`).expect(200);
    expect(charged.body).toMatchObject({
      status: 'in_production',
      paymentStatus: 'captured',
      capturedCents: order.total,
    });
    expect(harness.stripeState.paymentIntents.get(order.paymentIntentId)!.amount_received).toBe(order.total);
  });
});
