import { Router } from 'express';
import type { Db } from '../../db/knex.ts';
import { createHoopRequest, updateHoopRequest, type UpdateHoopRequest } from '../../contracts/admin-catalogue-hoops.ts';
import { validate } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import { createCatalogueRow, type RowWording } from './catalogue-rows.ts';
import { mountEditAndRetireRoutes } from './admin-row-routes.ts';

const wording: RowWording = {
  noun: 'hoop',
  uniqueField: 'slug',
  duplicateMessage: 'Another hoop already uses this short name',
};

const toRow = (hoop: UpdateHoopRequest) => ({
  name: hoop.name,
  field_width_mm: hoop.fieldWidthMm,
  field_height_mm: hoop.fieldHeightMm,
  ...(hoop.sortOrder === undefined ? {} : { sort_order: hoop.sortOrder }),
});

/** The studio's hoops: the sewing fields the hooping plan may use. */
export function createCatalogueHoopsRouter(deps: { db: Db }): Router {
  const router = Router();
  router.post('/', validate(createHoopRequest), async (req, res) => {
    sendResult(
      res,
      await createCatalogueRow(deps.db, 'hoops', { slug: req.body.slug, ...toRow(req.body) }, wording),
      201,
    );
  });
  mountEditAndRetireRoutes(router, deps.db, { table: 'hoops', wording, updateRequest: updateHoopRequest, toRow });
  return router;
}
