import { Router } from 'express';
import type { OverviewService } from './overview-service.ts';

export function createAdminOverviewRouter(deps: { overview: OverviewService }): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    res.json(await deps.overview.read());
  });
  return router;
}
