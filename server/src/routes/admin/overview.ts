import { Router } from 'express';
import type { Db } from '../../db/knex.ts';
import { readOrderOverview } from '../../db/repos/order-overview-repo.ts';

export function createAdminOverviewRouter(deps: { db: Db }): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    res.json(await readOrderOverview(deps.db, 12));
  });
  return router;
}
