import { Router } from 'express';
import type { Db } from '../../db/knex.ts';
import {
  createThreadRequest,
  updateThreadRequest,
  type UpdateThreadRequest,
} from '../../contracts/admin-catalogue-threads.ts';
import { hexToLab } from '../../engine/index.ts';
import { validate } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import { createCatalogueRow, type RowWording } from './catalogue-rows.ts';
import { mountEditAndRetireRoutes } from './admin-row-routes.ts';

const wording: RowWording = {
  noun: 'thread',
  uniqueField: 'code',
  duplicateMessage: 'Another thread already has this code',
};

/** The row to store; CIELAB is worked out from the hex colour (culori, D65) unless the studio measured its own. */
function toRow(thread: UpdateThreadRequest) {
  // The contract only lets a #RRGGBB hex through, which always converts.
  const lab = thread.lab ?? hexToLab(thread.hex)!;
  return {
    name: thread.name,
    hex: thread.hex,
    lab_l: lab.l.toFixed(4),
    lab_a: lab.a.toFixed(4),
    lab_b: lab.b.toFixed(4),
    ...(thread.sortOrder === undefined ? {} : { sort_order: thread.sortOrder }),
  };
}

/** The thread palette customers choose colours from and motifs name by code. */
export function createCatalogueThreadsRouter(deps: { db: Db }): Router {
  const router = Router();
  router.post('/', validate(createThreadRequest), async (req, res) => {
    sendResult(
      res,
      await createCatalogueRow(deps.db, 'threads', { code: req.body.code, ...toRow(req.body) }, wording),
      201,
    );
  });
  mountEditAndRetireRoutes(router, deps.db, { table: 'threads', wording, updateRequest: updateThreadRequest, toRow });
  return router;
}
