import { Router } from 'express';
import type { z } from 'zod';
import type { Db } from '../../db/knex.ts';
import { findOwnedArtworkImage } from '../artwork/artwork-repo.ts';
import { readOrderArtworkOwner } from './order-detail-repo.ts';
import { orderArtworkParams } from '../../contracts/admin-orders.ts';
import { HttpError } from '../../middleware/http-error.ts';
import { validate } from '../../middleware/validate.ts';
import { sendArtworkImage } from '../artwork/routes.ts';

/**
 * The customer's own pictures an order stitches, for the studio to digitize: only uploads the order's designs
 * place, and only the order's customer's. Mounted under /api/admin, so staff and owner only.
 */
export function createOrderArtworkRouter(deps: { db: Db }): Router {
  const router = Router();
  router.get('/:number/artwork/:uploadId/image', validate(orderArtworkParams, 'params'), async (_req, res) => {
    const { number, uploadId } = res.locals.params as z.infer<typeof orderArtworkParams>;
    const order = await readOrderArtworkOwner(deps.db, number);
    if (!order) throw new HttpError('not-found', `There is no order ${number}.`);
    const image = order.uploadIds.includes(uploadId)
      ? await findOwnedArtworkImage(deps.db, { userId: order.customerId }, uploadId)
      : undefined;
    if (!image) throw new HttpError('not-found', `Order ${number} has no uploaded picture ${uploadId}.`);
    sendArtworkImage(res, image);
  });
  return router;
}
