import { Router } from 'express';
import { garmentSlugParams } from '../../contracts/catalogue.ts';
import { validated } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import type { CatalogueService } from './catalogue-service.ts';

/** Public catalogue: what a visitor can choose before signing in. */
export function createCatalogueRouter(deps: { catalogue: CatalogueService }): Router {
  const { catalogue } = deps;
  const router = Router();
  router.get('/garments', async (_req, res) => {
    res.json(await catalogue.garments());
  });
  router.get(
    '/garments/:slug',
    validated({ params: garmentSlugParams }, async ({ params }, _req, res) => {
      sendResult(res, await catalogue.garment(params.slug));
    }),
  );
  router.get('/motifs', async (_req, res) => {
    res.json(await catalogue.motifs());
  });
  router.get('/fonts', async (_req, res) => {
    res.json(await catalogue.fonts());
  });
  router.get('/threads', async (_req, res) => {
    res.json(await catalogue.threads());
  });
  router.get('/hoops', async (_req, res) => {
    res.json(await catalogue.hoops());
  });
  return router;
}
