import { Router } from 'express';
import type { z } from 'zod';
import type { Db } from '../../db/knex.ts';
import { orderNumberParams, type OrderDetailResponse } from '../../contracts/admin-orders.ts';
import { readOrderDetail } from './order-detail-repo.ts';
import { HttpError } from '../../middleware/http-error.ts';
import { availableOrderActions } from './order-flow.ts';
import { validate } from '../../middleware/validate.ts';

export function createAdminOrdersRouter(deps: { db: Db }): Router {
  const router = Router();
  router.get('/:number', validate(orderNumberParams, 'params'), async (_req, res) => {
    const { number } = res.locals.params as z.infer<typeof orderNumberParams>;
    const detail = await readOrderDetail(deps.db, number);
    if (!detail) throw new HttpError('not-found', `There is no order ${number}.`);
    // The studio's buttons follow the state machine; staff and owner may make the same moves.
    const studioActions = availableOrderActions(detail.order.status, 'staff').filter(
      (action) => action !== 'authorize' && action !== 'request_changes' && action !== 'approve_proof',
    );
    res.json({
      ...detail,
      studioActions: studioActions as OrderDetailResponse['studioActions'],
    } satisfies OrderDetailResponse);
  });
  return router;
}
