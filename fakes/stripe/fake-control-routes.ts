import { Router } from 'express';
import type { FakeStripeContext } from './fake-stripe-context.ts';
import { snapshotFakeStripeState, type StripeEvent, type WebhookDelivery } from './fake-stripe-state.ts';

/** Test-only endpoints under `/_fake`: read the whole state, and redeliver an event to check idempotent handling. */
export function createFakeControlRouter(
  ctx: FakeStripeContext,
  redeliver: (event: StripeEvent) => Promise<WebhookDelivery | undefined>,
): Router {
  const router = Router();

  router.get('/state', (_req, res) => {
    res.json(snapshotFakeStripeState(ctx.state));
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
