import type { Router } from 'express';
import type { z } from 'zod';
import type { Db } from '../../db/knex.ts';
import type { CatalogueTable } from './catalogue-row-repo.ts';
import { catalogueIdParams } from '../../contracts/admin-catalogue-common.ts';
import { validate } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import { editCatalogueRow, setCatalogueRowActive, type RowWording } from './catalogue-rows.ts';

interface EditableRows<U> {
  table: CatalogueTable;
  wording: RowWording;
  updateRequest: z.ZodType<U>;
  /** The columns an edit writes; the row's slug or code is not among them, as designs refer to it. */
  toRow: (request: U) => Record<string, unknown>;
}

/**
 * The routes every retirable catalogue row shares: `PUT /:id` edits it, `POST /:id/retire` hides it from customers
 * and `POST /:id/reactivate` offers it again.
 */
export function mountEditAndRetireRoutes<U>(router: Router, db: Db, rows: EditableRows<U>): void {
  const byId = validate(catalogueIdParams, 'params');
  router.put('/:id', byId, validate(rows.updateRequest), async (req, res) => {
    sendResult(
      res,
      await editCatalogueRow(db, rows.table, { id: res.locals.params.id }, rows.toRow(req.body), rows.wording),
    );
  });
  mountRetireRoutes(router, db, rows.table, rows.wording);
}

/** `POST /:id/retire` hides the row from customers; `POST /:id/reactivate` offers it again. */
export function mountRetireRoutes(router: Router, db: Db, table: CatalogueTable, wording: RowWording): void {
  for (const [action, isActive] of [
    ['retire', false],
    ['reactivate', true],
  ] as const) {
    router.post(`/:id/${action}`, validate(catalogueIdParams, 'params'), async (_req, res) => {
      sendResult(res, await setCatalogueRowActive(db, table, res.locals.params.id, isActive, wording));
    });
  }
}
