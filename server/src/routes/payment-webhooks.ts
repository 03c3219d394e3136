import express, { Router } from 'express';
import type Stripe from 'stripe';
import type { Db } from '../db/knex.ts';
import { recordWebhookEvent } from '../db/repos/webhook-event-repo.ts';
import { HttpError } from '../middleware/http-error.ts';

/**
 * Stripe's webhook endpoint. The signature is checked over the raw body (re-serialised JSON would not match), so this
 * router is mounted before the JSON parser. Each event id is recorded once; redeliveries are acknowledged only.
 */
export function createPaymentWebhookRouter(deps: { db: Db; stripe: Stripe; webhookSecret: string; now: () => Date }): Router {
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
    const isNew = await recordWebhookEvent(deps.db, {
      id: event.id,
      type: event.type,
      payload: req.body.toString('utf8'),
      receivedAt: deps.now(),
    });
    res.json({ received: true, duplicate: !isNew });
  });
  return router;
}
