import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startStripeFake } from '../../fakes/stripe/server.ts';
import type { IdPrefix } from '../../fakes/stripe/fake-stripe-context.ts';
import { checkoutStartedResponse } from '../../server/src/contracts/orders.ts';
import { startApiHarness, type ApiAgent, type ApiHarness } from '../support/api-harness.ts';
import { signedInAgent, errorOf } from '../support/api-calls.ts';
import { payWithTestCard, priyaShipTo, quoteSavedDesign } from '../support/priya-orders.ts';

const STRIPE_KEY = 'sk_test_restarts';
const WEBHOOK_SECRET = 'whsec_restarts';
const folder = mkdtempSync(join(tmpdir(), 'hw-stand-in-'));
const stateFile = join(folder, 'stripe.json');

let harness: ApiHarness;
let port: number;
let standIn: Awaited<ReturnType<typeof startStripeFake>>;

/** The payment stand-in on the one port the app was configured with, as `npm start` starts it each day. */
const startStandIn = (extra: { mintId?: (prefix: IdPrefix) => string } = {}) =>
  startStripeFake({ port, apiKey: STRIPE_KEY, webhookSecret: WEBHOOK_SECRET, stateFile, ...extra });

beforeAll(async () => {
  standIn = await startStripeFake({ port: 0, apiKey: STRIPE_KEY, webhookSecret: WEBHOOK_SECRET, stateFile });
  port = Number(new URL(standIn.url).port);
  harness = await startApiHarness({
    env: {
      STRIPE_API_URL: standIn.url,
      STRIPE_SECRET_KEY: STRIPE_KEY,
      STRIPE_WEBHOOK_SECRET: WEBHOOK_SECRET,
      // Holds across restarts: a 30-day window holds the test orders' cards (due Dec 18) instead of saving them.
      CARD_HOLD_WINDOW_DAYS: '30',
    },
  });
});
afterAll(async () => {
  await harness.close();
  await standIn.close();
  rmSync(folder, { recursive: true, force: true });
});

/** Prices Priya's seeded design 1 and orders it; answers the response. */
async function orderDesignOne(agent: ApiAgent, expectedStatus: number) {
  const quote = await quoteSavedDesign(agent);
  return agent
    .post('/api/orders')
    .send({ quoteId: quote.quoteId, designId: 1, neededBy: '2026-12-18', shipTo: priyaShipTo })
    .expect(expectedStatus);
}

describe('the payment stand-in across restarts', () => {
  it('when the stand-in restarts between two paid orders, then both are paid, and the first hold is still known', async () => {
    const agent = await signedInAgent(harness, 'priya@example.test');
    const first = checkoutStartedResponse.parse((await orderDesignOne(agent, 201)).body);
    expect(await payWithTestCard(first.checkoutUrl!)).toBe(303);

    await standIn.close();
    standIn = await startStandIn();

    const second = checkoutStartedResponse.parse((await orderDesignOne(agent, 201)).body);
    expect(second.checkoutUrl).not.toBe(first.checkoutUrl);
    expect(await payWithTestCard(second.checkoutUrl!)).toBe(303);

    // What the app stored yesterday can still be asked about today, as with the real service.
    const firstPayment = await harness
      .db('payments')
      .join('orders', 'orders.id', 'payments.order_id')
      .where('orders.number', first.number)
      .first('payments.checkout_session_id');
    const remembered = standIn.state.checkoutSessions.get(firstPayment.checkout_session_id);
    expect(remembered?.session.status).toBe('complete');
    const intent = standIn.state.paymentIntents.get(remembered!.session.payment_intent!);
    expect(intent?.status).toBe('requires_capture');
  });

  it('when a provider hands out an id another order already has, then the order is placed and its page offers to pay, with no 500', async () => {
    const agent = await signedInAgent(harness, 'priya@example.test');
    const taken = (await harness.db('payments').whereNotNull('checkout_session_id').first('checkout_session_id'))
      .checkout_session_id as string;
    // A faulty provider that starts counting again after a restart: its next session id is one already stored.
    await standIn.close();
    standIn = await startStandIn({ mintId: (prefix) => (prefix === 'cs' ? taken : `${prefix}_repeated`) });

    const placed = checkoutStartedResponse.parse((await orderDesignOne(agent, 201)).body);
    expect(placed.checkoutUrl).toBe(`${harness.config.appOrigin}/orders/${placed.number}`);
    const order = await harness.db('orders').where({ number: placed.number }).first('id', 'status');
    expect(order.status).toBe('awaiting_payment');
    expect(await harness.db('payments').where({ order_id: order.id }).pluck('status')).toEqual(['failed']);

    // Paying again from the order page while the provider still repeats itself: a sentence, not a 500.
    const again = await agent.post(`/api/orders/${placed.number}/payment`).expect(409);
    expect(errorOf(again.body).message).toMatch(/payment service gave this payment a reference that another order/);

    await standIn.close();
    standIn = await startStandIn();
    const retried = checkoutStartedResponse.parse(
      (await agent.post(`/api/orders/${placed.number}/payment`).expect(201)).body,
    );
    expect(await payWithTestCard(retried.checkoutUrl!)).toBe(303);
  });

  it('when the studio charges a hold the provider has never heard of, then it answers 409 with a sentence, not 500', async () => {
    const staff = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
    const order = await harness.db('orders').where({ status: 'proof_approved' }).first('id', 'number');
    if (!order) throw new Error('The seeds should hold an order with an approved proof.');
    // A hold the app recorded but the payment service does not know (another account, or data restored elsewhere).
    const unknownIntent = 'pi_NeverMintedByThisStandIn00';
    await harness
      .db('payments')
      .where({ order_id: order.id })
      .update({
        status: 'authorized',
        payment_intent_id: unknownIntent,
        amount_authorized_cents: 1000,
        capture_before: new Date('2027-01-01T00:00:00Z'),
      });
    const res = await staff.post(`/api/admin/orders/${order.number}/capture`).send({});
    expect(res.status).toBe(409);
    expect(errorOf(res.body).message).toContain(unknownIntent);
    expect(errorOf(res.body).message).toMatch(/no record of this order's card hold/);
  });
});
