import { Router } from 'express';
import type { z } from 'zod';
import type { Db } from '../../db/knex.ts';
import { findActiveGarmentDetail, listActiveGarments } from './garment-repo.ts';
import { listActiveMotifs } from './motif-repo.ts';
import { listActiveLetteringFonts } from './lettering-font-repo.ts';
import { listActiveThreads } from './thread-repo.ts';
import { listActiveHoops } from './hoop-repo.ts';
import {
  garmentSlugParams,
  type fontListResponse,
  type garmentDetailResponse,
  type GarmentListResponse,
  type hoopListResponse,
  type MotifListResponse,
  type threadListResponse,
} from '../../contracts/catalogue.ts';
import { validate } from '../../middleware/validate.ts';
import { HttpError } from '../../middleware/http-error.ts';

/** Public catalogue: what a visitor can choose before signing in. */
export function createCatalogueRouter(deps: { db: Db }): Router {
  const router = Router();
  router.get('/garments', async (_req, res) => {
    const body: GarmentListResponse = { garments: await listActiveGarments(deps.db) };
    res.json(body);
  });
  router.get('/garments/:slug', validate(garmentSlugParams, 'params'), async (_req, res) => {
    const { slug } = res.locals.params as z.infer<typeof garmentSlugParams>;
    const garment = await findActiveGarmentDetail(deps.db, slug);
    if (!garment) throw new HttpError('not-found', `There is no garment “${slug}” on offer.`);
    const body: z.infer<typeof garmentDetailResponse> = { garment };
    res.json(body);
  });
  router.get('/motifs', async (_req, res) => {
    const body: MotifListResponse = { motifs: await listActiveMotifs(deps.db) };
    res.json(body);
  });
  router.get('/fonts', async (_req, res) => {
    const body: z.infer<typeof fontListResponse> = { fonts: await listActiveLetteringFonts(deps.db) };
    res.json(body);
  });
  router.get('/threads', async (_req, res) => {
    const body: z.infer<typeof threadListResponse> = { threads: await listActiveThreads(deps.db) };
    res.json(body);
  });
  router.get('/hoops', async (_req, res) => {
    const body: z.infer<typeof hoopListResponse> = { hoops: await listActiveHoops(deps.db) };
    res.json(body);
  });
  return router;
}
