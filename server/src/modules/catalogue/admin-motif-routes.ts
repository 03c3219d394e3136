import { Router } from 'express';
import type { Db } from '../../db/knex.ts';
import { catalogueIdParams } from '../../contracts/admin-catalogue-common.ts';
import { createMotifRequest, motifPreviewFields, updateMotifRequest } from '../../contracts/admin-catalogue-motifs.ts';
import type { CurrentUser } from '../../contracts/users.ts';
import { failure } from '../../contracts/result.ts';
import { validate } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import { singleUpload } from '../../middleware/upload.ts';
import { createCatalogueMotifService, motifWording } from './motif-service.ts';
import { mountRetireRoutes } from './admin-row-routes.ts';

/**
 * Motifs: `POST /preview` takes the artwork as a multipart upload (field `file`) and answers what it would
 * become; saving sends that sanitized SVG back in the JSON body, where it is sanitized and measured again.
 */
export function createCatalogueMotifsRouter(deps: { db: Db; uploadMaxBytes: number }): Router {
  const router = Router();
  const motifs = createCatalogueMotifService(deps);

  router.post('/preview', singleUpload(deps.uploadMaxBytes), validate(motifPreviewFields), async (req, res) => {
    if (!req.file)
      return sendResult(res, failure('invalid', 'Choose an SVG file to upload.', { file: 'Choose an SVG file' }));
    sendResult(res, await motifs.preview(req.file.buffer, req.body.widthMm));
  });
  router.post('/', validate(createMotifRequest), async (req, res) => {
    sendResult(res, await motifs.create(req.body, (req.user as CurrentUser).id), 201);
  });
  router.put('/:id', validate(catalogueIdParams, 'params'), validate(updateMotifRequest), async (req, res) => {
    sendResult(res, await motifs.update(res.locals.params.id, req.body));
  });
  mountRetireRoutes(router, deps.db, 'motifs', motifWording);
  return router;
}
