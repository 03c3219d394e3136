import Stripe from 'stripe';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { startStripeFake } from '../../../fakes/stripe/server.ts';
import { signWebhookPayload } from '../../../fakes/stripe/webhook-signature.ts';
import {
  API_KEY,
  WEBHOOK_SECRET,
  orderSeven,
  startWebhookReceiver,
  stripeClientFor,
  submitPaymentForm,
} from './stripe-fake-helpers.ts';

// Signature scheme, default tolerance and test vector: ../shared/reference/trade-facts.md "Payments (Stripe)"
// (stripe-node 23.1.0 source; docs.stripe.com/webhooks/signatures).
const VECTOR = {
  secret: 'whsec_test_secret',
  timestamp: 1700000000,
  payload: '{"id":"evt_test_webhook","object":"event"}',
  v1: 'd95c6b7477fbd7e9f90b1b0ef5f9c7ac25abca5382460e0d988c2b2a5b71b990',
};

const cleanups: (() => Promise<void>)[] = [];
afterEach(async () => {
  while (cleanups.length > 0) await cleanups.pop()!();
});

/** A fake on the real clock (the receiver checks signature age against Date.now) with a paid manual-capture session. */
async function startWithPaidSession(receiverUrl: string) {
  const fake = await startStripeFake({
    port: 0,
    apiKey: API_KEY,
    webhookSecret: WEBHOOK_SECRET,
    webhookUrl: receiverUrl,
  });
  cleanups.push(fake.close);
  const session = await stripeClientFor(fake.url).checkout.sessions.create(orderSeven);
  expect((await submitPaymentForm(session.url!)).status).toBe(303);
  return fake;
}

async function startReceiver(opts: { secret?: string; failFirst?: number } = {}) {
  const receiver = await startWebhookReceiver({ secret: opts.secret ?? WEBHOOK_SECRET, failFirst: opts.failFirst });
  cleanups.push(receiver.close);
  return receiver;
}

describe('webhook signatures', () => {
  it('when the published test vector is signed, then the header matches it and the SDK helper', () => {
    const header = signWebhookPayload(VECTOR.payload, VECTOR.secret, VECTOR.timestamp);
    expect(header).toBe(`t=${VECTOR.timestamp},v1=${VECTOR.v1}`);
    expect(
      Stripe.webhooks.generateTestHeaderString({
        payload: VECTOR.payload,
        secret: VECTOR.secret,
        timestamp: VECTOR.timestamp,
      }),
    ).toBe(header);
  });

  it('when the SDK verifies the vector, then it is accepted at 299 s of age and refused at 301 s', () => {
    const header = signWebhookPayload(VECTOR.payload, VECTOR.secret, VECTOR.timestamp);
    const verifyAt = (ageSeconds: number) => () =>
      Stripe.webhooks.constructEvent(
        VECTOR.payload,
        header,
        VECTOR.secret,
        undefined,
        undefined,
        (VECTOR.timestamp + ageSeconds) * 1000,
      );
    expect(verifyAt(299)().id).toBe('evt_test_webhook');
    expect(verifyAt(301)).toThrow(/tolerance/);
  });

  it('when the receiver holds another secret, then it refuses the delivery and the fake records the failure', async () => {
    const receiver = await startReceiver({ secret: 'whsec_not_the_same' });
    const fake = await startWithPaidSession(receiver.url);
    await vi.waitFor(() => expect(fake.state.deliveries.every((d) => d.status === 'failed')).toBe(true), {
      timeout: 5_000,
    });
    expect(fake.state.deliveries[0]).toMatchObject({ statusCode: 400, attempts: 4 });
    expect(receiver.rejections[0]).toContain('No signatures found matching the expected signature');
  });
});

describe('webhook delivery', () => {
  it('when the endpoint fails at first, then the fake retries until it is accepted', async () => {
    const receiver = await startReceiver({ failFirst: 2 });
    const fake = await startWithPaidSession(receiver.url);
    await vi.waitFor(() => expect(receiver.events).toHaveLength(2), { timeout: 5_000 });
    expect(fake.state.deliveries[0]).toMatchObject({
      type: 'checkout.session.completed',
      status: 'delivered',
      statusCode: 200,
      attempts: 3,
    });
    expect(fake.state.deliveries[1]).toMatchObject({ type: 'payment_intent.amount_capturable_updated', attempts: 1 });
  });

  it('when nobody listens, then the delivery is marked failed after a few attempts', async () => {
    const receiver = await startReceiver();
    await receiver.close();
    cleanups.pop();
    const fake = await startWithPaidSession(receiver.url);
    await vi.waitFor(() => expect(fake.state.deliveries.every((d) => d.status === 'failed')).toBe(true), {
      timeout: 8_000,
    });
    expect(fake.state.deliveries[0]).toMatchObject({ statusCode: null, attempts: 4, lastError: expect.any(String) });
  });

  it('when an event is resent, then the receiver gets the same event id again', async () => {
    const receiver = await startReceiver();
    const fake = await startWithPaidSession(receiver.url);
    await vi.waitFor(() => expect(receiver.events).toHaveLength(2));
    const [completed] = fake.state.events;
    const resend = await fetch(`${fake.url}/_fake/resend/${completed.id}`, { method: 'POST' });
    expect(resend.status).toBe(200);
    expect(await resend.json()).toMatchObject({ eventId: completed.id, status: 'delivered', statusCode: 200 });
    expect(receiver.events.map((event) => event.id)).toEqual([completed.id, fake.state.events[1].id, completed.id]);
    expect((await fetch(`${fake.url}/_fake/resend/evt_test_999999`, { method: 'POST' })).status).toBe(404);
  });

  it('when the state is requested over HTTP, then it lists sessions, intents, events and deliveries', async () => {
    const receiver = await startReceiver();
    const fake = await startWithPaidSession(receiver.url);
    const state = await (await fetch(`${fake.url}/_fake/state`)).json();
    const [sessionId] = Object.keys(state.checkoutSessions);
    expect(Object.keys(state.checkoutSessions)).toEqual([sessionId]);
    const intentId = state.checkoutSessions[sessionId].session.payment_intent;
    expect(state.paymentIntents[intentId].status).toBe('requires_capture');
    expect(state.events.map((event: { type: string }) => event.type)).toEqual([
      'checkout.session.completed',
      'payment_intent.amount_capturable_updated',
    ]);
    expect(state.deliveries).toHaveLength(2);
  });

  it('when the webhook URL is not on loopback, then the fake refuses to start', async () => {
    await expect(
      startStripeFake({
        port: 0,
        apiKey: API_KEY,
        webhookSecret: WEBHOOK_SECRET,
        webhookUrl: 'https://hooks.example.com/stripe',
      }),
    ).rejects.toThrow(/loopback only/);
  });
});
