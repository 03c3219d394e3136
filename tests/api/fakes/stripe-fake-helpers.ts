import express from 'express';
import Stripe from 'stripe';
import { serveHttpOnLoopback } from '../../../fakes/loopback-server.ts';

export const API_KEY = 'sk_test_fake_helpers_0001';
export const WEBHOOK_SECRET = 'whsec_fake_helpers_0001';
/** 2026-12-01T10:00:00Z: the fakes' clock in these tests, so ids, timestamps and card expiry never drift. */
export const FIXED_NOW_MS = Date.parse('2026-12-01T10:00:00Z');

/** The official SDK configured as the server configures it against the fake (stack notes §5). */
export function stripeClientFor(fakeUrl: string, apiKey = API_KEY): Stripe {
  const { hostname, port } = new URL(fakeUrl);
  return new Stripe(apiKey, { host: hostname, port: Number(port), protocol: 'http', maxNetworkRetries: 0 });
}

/** A webhook endpoint that verifies every delivery with `stripe.webhooks.constructEvent`, as the server does. */
export async function startWebhookReceiver(opts: { secret: string; failFirst?: number; nowMs?: () => number }) {
  const events: Stripe.Event[] = [];
  const rejections: string[] = [];
  let failuresLeft = opts.failFirst ?? 0;
  const verifier = new Stripe('sk_test_receiver_only');
  const app = express();
  // Raw body: the signature covers the exact bytes, so re-serialised JSON would not verify.
  app.post('/webhooks', express.raw({ type: 'application/json' }), (req, res) => {
    if (failuresLeft > 0) {
      failuresLeft -= 1;
      res.status(503).json({ error: 'try again' });
      return;
    }
    try {
      events.push(
        verifier.webhooks.constructEvent(
          req.body,
          req.get('stripe-signature') ?? '',
          opts.secret,
          undefined,
          undefined,
          opts.nowMs?.(),
        ),
      );
      res.json({ received: true });
    } catch (error) {
      rejections.push((error as Error).message);
      res.status(400).json({ error: 'bad signature' });
    }
  });
  const server = await serveHttpOnLoopback(app, 0, '127.0.0.1');
  return { url: `${server.url}/webhooks`, events, rejections, close: server.close };
}

export const orderSeven = {
  mode: 'payment',
  line_items: [
    {
      price_data: { currency: 'usd', unit_amount: 2400, product_data: { name: 'Smocked romper, size 2T' } },
      quantity: 2,
    },
    { price_data: { currency: 'usd', unit_amount: 1600, product_data: { name: 'Monogram, 3 letters' } }, quantity: 1 },
  ],
  success_url: 'http://127.0.0.1:3999/checkout/done?session={CHECKOUT_SESSION_ID}',
  cancel_url: 'http://127.0.0.1:3999/checkout/cancelled',
  client_reference_id: 'order-7',
  customer_email: 'maren@wren-bobbin.test',
  metadata: { orderId: '7' },
  payment_intent_data: { capture_method: 'manual', metadata: { orderId: '7' } },
} satisfies Stripe.Checkout.SessionCreateParams;

export const testCard = { card_number: '4242 4242 4242 4242', expiry: '12/30', cvc: '123', name: 'Maren Threadgill' };

/** Submits the hosted payment form as a browser would. */
export function submitPaymentForm(sessionUrl: string, fields: Partial<typeof testCard> = {}): Promise<Response> {
  return fetch(sessionUrl, {
    method: 'POST',
    body: new URLSearchParams({ ...testCard, ...fields }),
    redirect: 'manual',
  });
}
