import { Router, type Request, type RequestHandler } from 'express';
import { currentUserOf } from '../../auth/roles.ts';
import { orderArtworkParams, orderNumberParams } from '../../contracts/admin-orders.ts';
import {
  cancelOrderRequest,
  dueOrdersQuery,
  orderBoardQuery,
  proofImageParams,
  refundOrderRequest,
  sendProofRequest,
  shipOrderRequest,
} from '../../contracts/studio-orders.ts';
import { HttpError } from '../../middleware/http-error.ts';
import { sendResult } from '../../middleware/send-result.ts';
import { validated } from '../../middleware/validate.ts';
import { singleUpload } from '../../middleware/upload.ts';
import { sendArtworkImage } from '../artwork/send-artwork-image.ts';
import type { OrderPaymentService, StudioActor } from './order-payment-service.ts';
import type { ProofService } from './proof-service.ts';
import type { OrderProductionSteps } from './order-production-steps.ts';
import type { StudioOrderService } from './studio-order-service.ts';
import type { OrderDesignService } from './order-design-service.ts';
import { proofDraftRequest, stitchFileParams, stitchFileRequest } from '../../contracts/proof-versions.ts';

export interface AdminOrdersDeps {
  orders: StudioOrderService;
  payments: OrderPaymentService;
  production: OrderProductionSteps;
  proofs: ProofService;
  designs: OrderDesignService;
  /** The production sheet's routes (`/:number/production-sheet…`), which the production module answers. */
  productionSheets: Router;
  uploadMaxBytes: number;
}

/** The signed-in studio member; the /api/admin guard has already refused anyone else. */
function actorOf(req: Request): StudioActor {
  const user = currentUserOf(req);
  if (!user || user.role === 'customer')
    throw new HttpError('forbidden', 'This part of Hoopwright is for the studio team only.');
  return { userId: user.id, role: user.role };
}

const byNumber = { params: orderNumberParams };

/**
 * Everything under /api/admin/orders, in one router: the board and the calendar, one order's page, its proofs,
 * money moves, production steps, the customer's pictures and the production sheet.
 */
export function createAdminOrdersRouter(deps: AdminOrdersDeps): Router {
  const router = Router();
  // A photo comes as multipart with its fields; a render request is plain JSON.
  const photoUpload = singleUpload(deps.uploadMaxBytes);
  const optionalPhoto: RequestHandler = (req, res, next) =>
    req.is('multipart/form-data') ? photoUpload(req, res, next) : next();

  router.get(
    '/',
    validated({ query: orderBoardQuery }, async ({ query }, _req, res) => {
      res.json(await deps.orders.board(query));
    }),
  );
  router.get(
    '/due',
    validated({ query: dueOrdersQuery }, async ({ query }, _req, res) => {
      res.json(await deps.orders.due(query));
    }),
  );
  router.get(
    '/:number',
    validated(byNumber, async ({ params }, _req, res) => {
      sendResult(res, await deps.orders.detail(params.number));
    }),
  );
  router.get(
    '/:number/artwork/:uploadId/image',
    validated({ params: orderArtworkParams }, async ({ params }, _req, res) => {
      const image = await deps.orders.artworkImage(params.number, params.uploadId);
      if (!image.ok) return sendResult(res, image);
      sendArtworkImage(res, image.value);
    }),
  );

  router.post(
    '/:number/proofs',
    optionalPhoto,
    validated({ ...byNumber, body: sendProofRequest }, async ({ params, body }, req, res) => {
      sendResult(res, await deps.proofs.send(params.number, body, req.file?.buffer, actorOf(req)), 201);
    }),
  );
  router.get(
    '/:number/proofs/preview',
    validated(byNumber, async ({ params }, _req, res) => {
      const image = await deps.proofs.preview(params.number);
      if (!image.ok) return sendResult(res, image);
      res.type('image/png').send(image.value);
    }),
  );
  router.get(
    '/:number/proofs/:version/image',
    validated({ params: proofImageParams }, async ({ params }, _req, res) => {
      const image = await deps.proofs.image(params.number, params.version);
      if (!image.ok) return sendResult(res, image);
      res.set('Cache-Control', 'private, max-age=3600').type('image/png').send(image.value);
    }),
  );

  router.get(
    '/:number/design',
    validated(byNumber, async ({ params }, _req, res) => {
      sendResult(res, await deps.designs.design(params.number));
    }),
  );
  router.post(
    '/:number/design/price',
    validated({ ...byNumber, body: proofDraftRequest }, async ({ params, body }, _req, res) => {
      sendResult(res, await deps.designs.draftPrice(params.number, body.document));
    }),
  );
  router.post(
    '/:number/design/picture',
    validated({ ...byNumber, body: proofDraftRequest }, async ({ params, body }, _req, res) => {
      const image = await deps.proofs.preview(params.number, body.document);
      if (!image.ok) return sendResult(res, image);
      res.type('image/png').send(image.value);
    }),
  );
  router.put(
    '/:number/placements/:placementId/stitch-file',
    validated({ params: stitchFileParams, body: stitchFileRequest }, async ({ params, body }, req, res) => {
      sendResult(res, await deps.designs.enterStitchFile(params.number, params.placementId, body, actorOf(req)));
    }),
  );

  router.post(
    '/:number/capture',
    validated(byNumber, async ({ params }, req, res) => {
      sendResult(res, await deps.payments.capture(params.number, actorOf(req)));
    }),
  );
  router.post(
    '/:number/cancel',
    validated({ ...byNumber, body: cancelOrderRequest }, async ({ params, body }, req, res) => {
      sendResult(res, await deps.payments.cancel(params.number, body, actorOf(req)));
    }),
  );
  router.post(
    '/:number/refunds',
    validated({ ...byNumber, body: refundOrderRequest }, async ({ params, body }, req, res) => {
      sendResult(res, await deps.payments.refund(params.number, body, actorOf(req)));
    }),
  );
  router.post(
    '/:number/stitched',
    validated(byNumber, async ({ params }, req, res) => {
      sendResult(res, await deps.production.markStitched(params.number, actorOf(req)));
    }),
  );
  router.post(
    '/:number/shipped',
    validated({ ...byNumber, body: shipOrderRequest }, async ({ params, body }, req, res) => {
      sendResult(res, await deps.production.ship(params.number, body, actorOf(req)));
    }),
  );

  router.use(deps.productionSheets);
  return router;
}
