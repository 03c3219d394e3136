import { Router } from 'express';
import type { Db } from '../../db/knex.ts';
import { readStudioCatalog } from '../../db/repos/studio-catalog-repo.ts';

export function createAdminCatalogRouter(deps: { db: Db }): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    res.json(await readStudioCatalog(deps.db));
  });
  return router;
}
