import express, { Router } from 'express';
import type Stripe from 'stripe';
import { HttpError } from '../../middleware/http-error.ts';
import type { PaymentWebhookService } from './payment-webhook-service.ts';

/**
 * Stripe's webhook endpoint. The signature is checked over the raw body (re-serialised JSON would not match), so this
 * router is mounted before the JSON parser. Each event id is recorded and applied once; redeliveries are acknowledged
 * only. A failure while applying answers 500, so the provider sends the event again.
 */
export function createPaymentWebhookRouter(deps: {
  stripe: Stripe;
  webhookSecret: string;
  webhooks: PaymentWebhookService;
}): Router {
  const router = Router();
  router.post('/', express.raw({ type: '*/*', limit: '1mb' }), async (req, res) => {
    const signature = req.get('stripe-signature');
    if (!signature || !Buffer.isBuffer(req.body)) {
      throw new HttpError('invalid', 'A Stripe-Signature header and a JSON body are required.');
    }
    let event: Stripe.Event;
    try {
      event = deps.stripe.webhooks.constructEvent(req.body, signature, deps.webhookSecret);
    } catch {
      throw new HttpError('invalid', 'The webhook signature does not match; the event was not accepted.');
    }
    const { isDuplicate } = await deps.webhooks.receive(event, req.body.toString('utf8'));
    res.json({ received: true, duplicate: isDuplicate });
  });
  return router;
}
