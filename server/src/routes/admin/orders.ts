import { Router } from 'express';
import type { z } from 'zod';
import type { Db } from '../../db/knex.ts';
import { orderNumberParams } from '../../contracts/admin-orders.ts';
import { readOrderDetail } from '../../db/repos/order-detail-repo.ts';
import { HttpError } from '../../middleware/http-error.ts';
import { validate } from '../../middleware/validate.ts';

export function createAdminOrdersRouter(deps: { db: Db }): Router {
  const router = Router();
  router.get('/:number', validate(orderNumberParams, 'params'), async (_req, res) => {
    const { number } = res.locals.params as z.infer<typeof orderNumberParams>;
    const detail = await readOrderDetail(deps.db, number);
    if (!detail) throw new HttpError('not-found', `There is no order ${number}.`);
    res.json(detail);
  });
  return router;
}
