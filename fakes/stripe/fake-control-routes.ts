import express, { Router } from 'express';
import { z } from 'zod';
import type { FakeStripeContext } from './fake-stripe-context.ts';
import { expireHoldNow, expireLapsedHolds } from './hold-expiry.ts';
import { snapshotFakeStripeState, type StripeEvent, type WebhookDelivery } from './fake-stripe-state.ts';

const clockSchema = z.object({
  advanceSeconds: z.coerce
    .number()
    .int()
    .min(0)
    .max(400 * 86_400),
});

/**
 * Test-only endpoints under `/_fake`: read the whole state, redeliver an event to check idempotent handling, move
 * the clock on (holds past their `capture_before` lapse) and let one hold lapse now.
 */
export function createFakeControlRouter(
  ctx: FakeStripeContext,
  redeliver: (event: StripeEvent) => Promise<WebhookDelivery | undefined>,
): Router {
  const router = Router();

  router.get('/state', (_req, res) => {
    res.json(snapshotFakeStripeState(ctx.state));
  });

  router.use(express.json());

  router.post('/clock', (req, res) => {
    const parsed = clockSchema.safeParse(req.body ?? {});
    if (!parsed.success) {
      res.status(400).json({ error: { message: 'Send { "advanceSeconds": <whole seconds, 0 or more> }.' } });
      return;
    }
    ctx.advanceClock(parsed.data.advanceSeconds);
    expireLapsedHolds(ctx);
    res.json({ nowSeconds: ctx.nowSeconds() });
  });

  router.post('/payment_intents/:id/expire', (req, res) => {
    const intent = ctx.state.paymentIntents.get(req.params.id);
    if (!intent) {
      res.status(404).json({ error: { message: `No such payment_intent: '${req.params.id}'` } });
      return;
    }
    if (intent.status !== 'requires_capture') {
      res.status(409).json({ error: { message: `This PaymentIntent holds nothing (status ${intent.status}).` } });
      return;
    }
    expireHoldNow(ctx, intent);
    res.json(intent);
  });

  router.post('/resend/:eventId', async (req, res) => {
    const event = ctx.state.events.find((candidate) => candidate.id === req.params.eventId);
    if (!event) {
      res.status(404).json({ error: { message: `No such event: '${req.params.eventId}'` } });
      return;
    }
    const delivery = await redeliver(event);
    if (!delivery) {
      res.status(409).json({ error: { message: 'This fake was started without a webhookUrl.' } });
      return;
    }
    res.json(delivery);
  });

  return router;
}
