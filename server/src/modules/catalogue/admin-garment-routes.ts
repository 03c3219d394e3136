import { Router } from 'express';
import type { Db } from '../../db/knex.ts';
import { listStudioGarments } from './studio-garment-repo.ts';
import { catalogueIdParams } from '../../contracts/admin-catalogue-common.ts';
import {
  createGarmentRequest,
  fabricColourRequest,
  garmentPartParams,
  garmentSizeRequest,
  updateGarmentRequest,
  type StudioGarmentListResponse,
} from '../../contracts/admin-catalogue-garments.ts';
import { validate } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import { createCatalogueGarmentService, garmentWording } from './garment-service.ts';
import { mountRetireRoutes } from './admin-row-routes.ts';

const byId = validate(catalogueIdParams, 'params');
const byPart = validate(garmentPartParams, 'params');

/** Garments, their sizes (hem lengths, zones, mockup scale) and fabric colours, hidden ones included. */
export function createCatalogueGarmentsRouter(deps: { db: Db }): Router {
  const router = Router();
  const garments = createCatalogueGarmentService(deps);

  router.get('/', async (_req, res) => {
    const body: StudioGarmentListResponse = { garments: await listStudioGarments(deps.db) };
    res.json(body);
  });
  router.post('/', validate(createGarmentRequest), async (req, res) => {
    sendResult(res, await garments.create(req.body), 201);
  });
  router.put('/:id', byId, validate(updateGarmentRequest), async (req, res) => {
    sendResult(res, await garments.update(res.locals.params.id, req.body));
  });
  mountRetireRoutes(router, deps.db, 'garments', garmentWording);

  const partRequests = { sizes: garmentSizeRequest, colours: fabricColourRequest } as const;
  for (const part of ['sizes', 'colours'] as const) {
    router.post(`/:id/${part}`, byId, validate(partRequests[part]), async (req, res) => {
      sendResult(res, await garments.addPart(part, res.locals.params.id, req.body), 201);
    });
    router.put(`/:id/${part}/:partId`, byPart, validate(partRequests[part]), async (req, res) => {
      sendResult(res, await garments.updatePart(part, res.locals.params.id, res.locals.params.partId, req.body));
    });
    router.delete(`/:id/${part}/:partId`, byPart, async (_req, res) => {
      sendResult(res, await garments.removePart(part, res.locals.params.id, res.locals.params.partId));
    });
  }
  return router;
}
