import { Router } from 'express';
import type { z } from 'zod';
import { catalogueIdParams } from '../../contracts/admin-catalogue-common.ts';
import {
  createGarmentRequest,
  fabricColourRequest,
  garmentPartParams,
  garmentSizeRequest,
  updateGarmentRequest,
} from '../../contracts/admin-catalogue-garments.ts';
import { createMotifRequest, motifPreviewFields, updateMotifRequest } from '../../contracts/admin-catalogue-motifs.ts';
import { createFontRequest, updateFontRequest } from '../../contracts/admin-catalogue-fonts.ts';
import { createThreadRequest, updateThreadRequest } from '../../contracts/admin-catalogue-threads.ts';
import { createHoopRequest, updateHoopRequest } from '../../contracts/admin-catalogue-hoops.ts';
import type { CatalogueRowRef } from '../../contracts/admin-catalogue-common.ts';
import { failure, type Result } from '../../contracts/result.ts';
import { currentUserOf } from '../../auth/roles.ts';
import { validated } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import { singleUpload } from '../../middleware/upload.ts';
import type { CatalogueService } from './catalogue-service.ts';
import type { CatalogueGarmentService } from './garment-service.ts';
import type { CatalogueMotifService } from './motif-service.ts';
import type { FontService } from './font-service.ts';
import type { ThreadService } from './thread-service.ts';
import type { HoopService } from './hoop-service.ts';

export interface AdminCatalogueDeps {
  catalogue: CatalogueService;
  garments: CatalogueGarmentService;
  motifs: CatalogueMotifService;
  fonts: FontService;
  threads: ThreadService;
  hoops: HoopService;
  uploadMaxBytes: number;
}

interface EditableRows {
  /** Left out where adding a row needs more than its request (a motif records who added it). */
  create?(request: unknown): Promise<Result<CatalogueRowRef>>;
  update(id: number, request: unknown): Promise<Result<CatalogueRowRef>>;
  setActive(id: number, isActive: boolean): Promise<Result<CatalogueRowRef>>;
}

/**
 * The routes every retirable catalogue row shares: `POST /` adds one, `PUT /:id` edits it, `POST /:id/retire` hides
 * it from customers and `POST /:id/reactivate` offers it again.
 */
function rowRouter(rows: EditableRows, requests: { create?: z.ZodType; update: z.ZodType }): Router {
  const router = Router();
  const { create } = rows;
  if (create && requests.create)
    router.post(
      '/',
      validated({ body: requests.create }, async ({ body }, _req, res) => {
        sendResult(res, await create(body), 201);
      }),
    );
  router.put(
    '/:id',
    validated({ params: catalogueIdParams, body: requests.update }, async ({ params, body }, _req, res) => {
      sendResult(res, await rows.update(params.id, body));
    }),
  );
  for (const [action, isActive] of [
    ['retire', false],
    ['reactivate', true],
  ] as const) {
    router.post(
      `/:id/${action}`,
      validated({ params: catalogueIdParams }, async ({ params }, _req, res) => {
        sendResult(res, await rows.setActive(params.id, isActive));
      }),
    );
  }
  return router;
}

/** The studio's catalogue (/api/admin/catalogue): the whole list, and garments, motifs, fonts, threads and hoops. */
export function createAdminCatalogueRouter(deps: AdminCatalogueDeps): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    res.json(await deps.catalogue.studioCatalogue());
  });

  const garments = Router();
  garments.get('/', async (_req, res) => {
    res.json({ garments: await deps.garments.list() });
  });
  const partRequests = { sizes: garmentSizeRequest, colours: fabricColourRequest } as const;
  for (const part of ['sizes', 'colours'] as const) {
    garments.post(
      `/:id/${part}`,
      validated({ params: catalogueIdParams, body: partRequests[part] }, async ({ params, body }, _req, res) => {
        sendResult(res, await deps.garments.addPart(part, params.id, body), 201);
      }),
    );
    garments.put(
      `/:id/${part}/:partId`,
      validated({ params: garmentPartParams, body: partRequests[part] }, async ({ params, body }, _req, res) => {
        sendResult(res, await deps.garments.updatePart(part, params.id, params.partId, body));
      }),
    );
    garments.delete(
      `/:id/${part}/:partId`,
      validated({ params: garmentPartParams }, async ({ params }, _req, res) => {
        sendResult(res, await deps.garments.removePart(part, params.id, params.partId));
      }),
    );
  }
  garments.use(rowRouter(deps.garments, { create: createGarmentRequest, update: updateGarmentRequest }));
  router.use('/garments', garments);

  // A motif's artwork comes as a multipart upload (field `file`) to preview; saving sends the sanitized SVG back in
  // the JSON body, where it is sanitized and measured again.
  const motifs = Router();
  motifs.post(
    '/preview',
    singleUpload(deps.uploadMaxBytes),
    validated({ body: motifPreviewFields }, async ({ body }, req, res) => {
      if (!req.file)
        return sendResult(res, failure('invalid', 'Choose an SVG file to upload.', { file: 'Choose an SVG file' }));
      sendResult(res, await deps.motifs.preview(req.file.buffer, body.widthMm));
    }),
  );
  motifs.post(
    '/',
    validated({ body: createMotifRequest }, async ({ body }, req, res) => {
      sendResult(res, await deps.motifs.create(body, currentUserOf(req)!.id), 201);
    }),
  );
  motifs.use(
    rowRouter({ update: deps.motifs.update, setActive: deps.motifs.setActive }, { update: updateMotifRequest }),
  );
  router.use('/motifs', motifs);

  const fonts = Router();
  fonts.get('/shipped', async (_req, res) => {
    res.json(await deps.fonts.shipped());
  });
  fonts.use(rowRouter(deps.fonts, { create: createFontRequest, update: updateFontRequest }));
  router.use('/fonts', fonts);

  router.use('/threads', rowRouter(deps.threads, { create: createThreadRequest, update: updateThreadRequest }));
  router.use('/hoops', rowRouter(deps.hoops, { create: createHoopRequest, update: updateHoopRequest }));
  return router;
}
