/**
 * The payment and mail stand-ins for API tests, on free ports, with the harness pointed at them. Webhook events
 * are not delivered by the stand-in (the app under supertest does not listen); `deliver` posts a recorded event
 * to the app signed as the stand-in would sign it, so a test decides when, and how often, an event arrives.
 */
import Stripe from 'stripe';
import type request from 'supertest';
import { startStripeFake, type FakeStripeState } from '../../fakes/stripe/server.ts';
import { startSmtpFake, type CapturedMail } from '../../fakes/smtp/server.ts';
import { startApiHarness, type ApiHarness } from './api-harness.ts';

const STRIPE_KEY = 'sk_test_api_tests';
const WEBHOOK_SECRET = 'whsec_api_tests';

export interface PaymentHarness extends ApiHarness {
  stripeState: FakeStripeState;
  mail: CapturedMail[];
  /** Posts a webhook event to the app, signed with the shared secret. */
  deliver(event: unknown): request.Test;
  /** Pays a Checkout Session on the stand-in's hosted page with a test card; resolves with the page's status. */
  pay(checkoutUrl: string, cardNumber?: string): Promise<number>;
  /** Delivers every event the stand-in has recorded since the last call, in order. */
  deliverNewEvents(): Promise<void>;
}

/**
 * `holdWindowDays` is how long a card hold lasts. The default here, 30, holds the card of every test order (Priya's
 * date, Dec 18, is inside it from the harness's Dec 1), which the tests of holds, captures and refunds rely on;
 * the tests of cards kept for later pass the shop's default of 7.
 */
export async function startPaymentHarness(options: { holdWindowDays?: number } = {}): Promise<PaymentHarness> {
  const stripe = await startStripeFake({ port: 0, apiKey: STRIPE_KEY, webhookSecret: WEBHOOK_SECRET });
  const smtp = await startSmtpFake({ smtpPort: 0, httpPort: 0 });
  const harness = await startApiHarness({
    env: {
      STRIPE_API_URL: stripe.url,
      STRIPE_SECRET_KEY: STRIPE_KEY,
      STRIPE_WEBHOOK_SECRET: WEBHOOK_SECRET,
      SMTP_URL: smtp.smtpUrl,
      CARD_HOLD_WINDOW_DAYS: String(options.holdWindowDays ?? 30),
    },
  });
  const signer = new Stripe('sk_test_signer_only');
  let delivered = 0;
  const deliver = (event: unknown) => {
    const payload = JSON.stringify(event, null, 2);
    return (
      harness
        .agent()
        .post('/api/webhooks/stripe')
        .set('Content-Type', 'application/json')
        // Header format and HMAC scheme as in Stripe's signature guide, made by the official SDK's own helper.
        .set('Stripe-Signature', signer.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET }))
        .send(payload)
    );
  };
  return {
    ...harness,
    stripeState: stripe.state,
    mail: smtp.messages,
    deliver,
    async pay(checkoutUrl, cardNumber = '4242 4242 4242 4242') {
      const form = new URLSearchParams({
        card_number: cardNumber,
        expiry: '12/30',
        cvc: '123',
        name: 'Priya Castellanos',
      });
      const response = await fetch(checkoutUrl, { method: 'POST', body: form, redirect: 'manual' });
      await response.arrayBuffer();
      return response.status;
    },
    async deliverNewEvents() {
      const events = stripe.state.events.slice(delivered);
      delivered = stripe.state.events.length;
      for (const event of events) await deliver(event).expect(200);
    },
    async close() {
      await harness.close();
      await stripe.close();
      await smtp.close();
    },
  };
}
