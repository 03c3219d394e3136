/**
 * Test-only steps the studio's tests need from other parts of the product: a card really held at the Stripe stand-in
 * for a seeded order (checkout's job in the app), and a proof approved as the customer's approval would (the
 * customer's endpoint belongs to the storefront). Both write what those parts write, through the same state machine.
 */
import Stripe from 'stripe';
import { startStripeFake } from '../../fakes/stripe/server.ts';
import type { Db } from '../../server/src/db/knex.ts';
import { moveOrder } from '../../server/src/modules/orders/order-transitions.ts';
import { fixedNow, startApiHarness } from './api-harness.ts';

/** The official SDK against a Stripe stand-in, configured as the server's own client is. */
export function stripeAt(fakeUrl: string, apiKey: string): Stripe {
  const { hostname, port } = new URL(fakeUrl);
  return new Stripe(apiKey, { host: hostname, port: Number(port), protocol: 'http', maxNetworkRetries: 0 });
}

/**
 * The API harness with its own Stripe stand-in (on the harness's fixed clock) and a staff member signed in: the
 * studio's money moves reach a real PaymentIntent at the stand-in.
 */
export async function startStudioHarness(apiKey: string) {
  const fake = await startStripeFake({
    port: 0,
    apiKey,
    webhookSecret: 'whsec_unused_here',
    now: () => fixedNow().getTime(),
  });
  const harness = await startApiHarness({ env: { STRIPE_API_URL: fake.url, STRIPE_SECRET_KEY: apiKey } });
  const staff = harness.agent();
  await harness.signIn(staff, 'tobias@wrenandbobbin.test');
  return {
    harness,
    fake,
    stripe: stripeAt(fake.url, apiKey),
    staff,
    async close() {
      await harness.close();
      await fake.close();
    },
  };
}

/** A capture-before a few days after the harness's clock, as a fresh hold has. */
export const inAWeek = new Date(fixedNow().getTime() + 6 * 86_400_000);

/**
 * Pays the order's total on the stand-in's hosted page with a test card (manual capture, so it is only held) and
 * points the order's payment row at the new PaymentIntent, holding until `captureBefore`.
 */
export async function holdCardAtFake(db: Db, stripe: Stripe, number: string, captureBefore: Date): Promise<string> {
  const order = await db('orders').where({ number }).first('id', 'total_cents', 'currency');
  const session = await stripe.checkout.sessions.create({
    mode: 'payment',
    line_items: [
      {
        price_data: {
          currency: order.currency.toLowerCase(),
          unit_amount: Number(order.total_cents),
          product_data: { name: `Order ${number}` },
        },
        quantity: 1,
      },
    ],
    success_url: 'http://127.0.0.1/done',
    cancel_url: 'http://127.0.0.1/cancelled',
    metadata: { orderId: String(order.id) },
    payment_intent_data: { capture_method: 'manual', metadata: { orderId: String(order.id) } },
  });
  const paid = await fetch(session.url!, {
    method: 'POST',
    body: new URLSearchParams({ card_number: '4242 4242 4242 4242', expiry: '12/30', cvc: '123', name: 'Test Parent' }),
    redirect: 'manual',
  });
  if (paid.status >= 400) throw new Error(`The stand-in refused the test card: ${paid.status}`);
  const paymentIntentId = (await stripe.checkout.sessions.retrieve(session.id)).payment_intent as string;
  const payment = await db('payments').where({ order_id: order.id }).orderBy('id', 'desc').first('id');
  await db('payments')
    .where({ id: payment.id })
    .update({
      checkout_session_id: session.id,
      payment_intent_id: paymentIntentId,
      status: 'authorized',
      amount_authorized_cents: Number(order.total_cents),
      amount_captured_cents: 0,
      amount_refunded_cents: 0,
      capture_before: captureBefore,
    });
  await db('orders').where({ id: order.id }).update({ payment_status: 'authorized' });
  return paymentIntentId;
}

/** Approves the order's latest proof as the customer's approval does: the proof answered, the order moved. */
export async function approveLatestProofAsCustomer(db: Db, number: string, now: Date): Promise<void> {
  await db.transaction(async (trx) => {
    const order = await trx('orders').where({ number }).first('id', 'customer_id');
    const moved = await moveOrder(trx, {
      orderId: order.id,
      action: 'approve_proof',
      actor: 'customer',
      actorUserId: order.customer_id,
      now,
    });
    if (!moved.ok) throw new Error(`Could not approve the proof of ${number}: ${moved.error.message}`);
    const proof = await trx('proofs').where({ order_id: order.id }).orderBy('version', 'desc').first('id', 'version');
    await trx('proofs').where({ id: proof.id }).update({ status: 'approved', responded_at: now });
  });
}

/** The customer asking for changes to the latest proof, as their answer would, through the same state machine. */
export async function requestChangesAsCustomer(db: Db, number: string, comment: string, now: Date): Promise<void> {
  await db.transaction(async (trx) => {
    const order = await trx('orders').where({ number }).first('id', 'customer_id');
    const moved = await moveOrder(trx, {
      orderId: order.id,
      action: 'request_changes',
      actor: 'customer',
      actorUserId: order.customer_id,
      note: comment,
      now,
    });
    if (!moved.ok) throw new Error(`Could not ask for changes to ${number}: ${moved.error.message}`);
    const proof = await trx('proofs').where({ order_id: order.id }).orderBy('version', 'desc').first('id');
    await trx('proofs')
      .where({ id: proof.id })
      .update({ status: 'changes_requested', customer_comment: comment, responded_at: now });
  });
}
