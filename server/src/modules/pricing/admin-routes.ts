import { Router } from 'express';
import type { z } from 'zod';
import { pricingPreviewRequest, ruleSetIdParams, updateDraftRequest } from '../../contracts/admin-pricing.ts';
import { currentUserOf } from '../../auth/roles.ts';
import { requireOwner } from '../../auth/require-owner.ts';
import { validate } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import type { PricingService } from './pricing-service.ts';

/** Price lists: staff may read them and preview a change; only the owner changes or publishes one. */
export function createAdminPricingRouter(deps: { pricing: PricingService }): Router {
  const router = Router();
  const idOf = (locals: Record<string, unknown>) => (locals.params as z.infer<typeof ruleSetIdParams>).id;

  router.get('/', async (req, res) => {
    res.json(await deps.pricing.list(currentUserOf(req)!));
  });
  router.post('/preview', validate(pricingPreviewRequest), async (req, res) => {
    sendResult(res, await deps.pricing.preview(req.body.rules));
  });
  router.post('/drafts', requireOwner('start a new price list'), async (req, res) => {
    sendResult(res, await deps.pricing.startDraft(currentUserOf(req)!), 201);
  });
  router.get('/:id', validate(ruleSetIdParams, 'params'), async (_req, res) => {
    sendResult(res, await deps.pricing.get(idOf(res.locals)));
  });
  router.put(
    '/:id',
    requireOwner('change the price list'),
    validate(ruleSetIdParams, 'params'),
    validate(updateDraftRequest),
    async (req, res) => {
      sendResult(res, await deps.pricing.updateDraft(idOf(res.locals), req.body));
    },
  );
  router.post(
    '/:id/publish',
    requireOwner('publish a price list'),
    validate(ruleSetIdParams, 'params'),
    async (_req, res) => {
      sendResult(res, await deps.pricing.publish(idOf(res.locals)));
    },
  );
  return router;
}
