import { Router } from 'express';
import type { Db } from '../../db/knex.ts';
import {
  createFontRequest,
  updateFontRequest,
  type ShippedFontListResponse,
  type UpdateFontRequest,
} from '../../contracts/admin-catalogue-fonts.ts';
import { failure } from '../../contracts/result.ts';
import { findShippedFont, listShippedFonts } from '../../integrations/shipped-fonts.ts';
import { validate } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import { createCatalogueRow, type RowWording } from './catalogue-rows.ts';
import { mountEditAndRetireRoutes } from './admin-row-routes.ts';

const wording: RowWording = {
  noun: 'lettering font',
  uniqueField: 'slug',
  duplicateMessage: 'Another lettering font already uses this short name',
};

const toRow = (font: UpdateFontRequest) => ({
  name: font.name,
  min_height_mm: font.minHeightMm,
  max_height_mm: font.maxHeightMm,
  ...(font.sortOrder === undefined ? {} : { sort_order: font.sortOrder }),
});

/** Lettering fonts: only fonts shipped with the app (so the server can measure them), activated, edited or retired. */
export function createCatalogueFontsRouter(deps: { db: Db }): Router {
  const router = Router();
  router.get('/shipped', async (_req, res) => {
    const used = new Set(
      (await deps.db('lettering_fonts').select('fontsource_package')).map((row) => row.fontsource_package as string),
    );
    const body: ShippedFontListResponse = {
      fonts: listShippedFonts().map((font) => ({ ...font, isInCatalogue: used.has(font.fontsourcePackage) })),
    };
    res.json(body);
  });
  router.post('/', validate(createFontRequest), async (req, res) => {
    const shipped = findShippedFont(req.body.fontsourcePackage);
    if (!shipped) {
      const message = 'That font is not shipped with the shop, so lettering in it could not be measured';
      return sendResult(res, failure('invalid', `${message}.`, { fontsourcePackage: message }));
    }
    const row = {
      slug: req.body.slug,
      font_family: shipped.fontFamily,
      fontsource_package: shipped.fontsourcePackage,
      file_name: shipped.fileName,
      ...toRow(req.body),
    };
    sendResult(res, await createCatalogueRow(deps.db, 'lettering_fonts', row, wording), 201);
  });
  mountEditAndRetireRoutes(router, deps.db, {
    table: 'lettering_fonts',
    wording,
    updateRequest: updateFontRequest,
    toRow,
  });
  return router;
}
