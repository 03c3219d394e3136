import { Router } from 'express';
import { pricingPreviewRequest, ruleSetIdParams, updateDraftRequest } from '../../contracts/admin-pricing.ts';
import { currentUserOf } from '../../auth/roles.ts';
import { requireOwner } from '../../auth/require-owner.ts';
import { validated } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import type { PricingService } from './pricing-service.ts';

/** Price lists: staff may read them and preview a change; only the owner changes or publishes one. */
export function createAdminPricingRouter(deps: { pricing: PricingService }): Router {
  const router = Router();
  router.get('/', async (req, res) => {
    res.json(await deps.pricing.list(currentUserOf(req)!));
  });
  router.post(
    '/preview',
    validated({ body: pricingPreviewRequest }, async ({ body }, _req, res) => {
      sendResult(res, await deps.pricing.preview(body.rules));
    }),
  );
  router.post('/drafts', requireOwner('start a new price list'), async (req, res) => {
    sendResult(res, await deps.pricing.startDraft(currentUserOf(req)!), 201);
  });
  router.get(
    '/:id',
    validated({ params: ruleSetIdParams }, async ({ params }, _req, res) => {
      sendResult(res, await deps.pricing.get(params.id));
    }),
  );
  router.put(
    '/:id',
    requireOwner('change the price list'),
    validated({ params: ruleSetIdParams, body: updateDraftRequest }, async ({ params, body }, _req, res) => {
      sendResult(res, await deps.pricing.updateDraft(params.id, body));
    }),
  );
  router.post(
    '/:id/publish',
    requireOwner('publish a price list'),
    validated({ params: ruleSetIdParams }, async ({ params }, _req, res) => {
      sendResult(res, await deps.pricing.publish(params.id));
    }),
  );
  return router;
}
