import { Router } from 'express';
import type { Db } from '../../db/knex.ts';
import { readStudioCatalogue } from './studio-catalogue-repo.ts';

export function createAdminCatalogueRouter(deps: { db: Db }): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    res.json(await readStudioCatalogue(deps.db));
  });
  return router;
}
