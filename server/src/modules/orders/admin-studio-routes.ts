import { Router, type Request, type RequestHandler } from 'express';
import type Stripe from 'stripe';
import type { z } from 'zod';
import type { Db } from '../../db/knex.ts';
import type { Mailer } from '../../integrations/mailer.ts';
import type { LetteringFontLoader } from '../../integrations/lettering-fonts.ts';
import { currentUserOf } from '../../auth/roles.ts';
import { orderNumberParams } from '../../contracts/admin-orders.ts';
import {
  cancelOrderRequest,
  dueOrdersQuery,
  orderBoardQuery,
  proofImageParams,
  refundOrderRequest,
  sendProofRequest,
  shipOrderRequest,
  type DueOrdersQuery,
  type OrderBoardQuery,
} from '../../contracts/studio-orders.ts';
import { listBoardOrders, listDueOrders } from './order-board-repo.ts';
import { HttpError } from '../../middleware/http-error.ts';
import { sendResult } from '../../middleware/send-result.ts';
import { validate } from '../../middleware/validate.ts';
import { singleUpload } from '../../middleware/upload.ts';
import { createOrderPaymentService, type StudioActor } from '../payments/order-payment-service.ts';
import { createOrderProductionSteps } from './order-production-steps.ts';
import { createProofService } from '../proofs/proof-service.ts';

export interface StudioOrdersDeps {
  db: Db;
  stripe: Stripe;
  mailer: Mailer;
  now: () => Date;
  appOrigin: string;
  uploadMaxBytes: number;
  fonts: LetteringFontLoader;
}

/** The signed-in studio member; the /api/admin guard has already refused anyone else. */
function actorOf(req: Request): StudioActor {
  const user = currentUserOf(req);
  if (!user || user.role === 'customer')
    throw new HttpError('forbidden', 'This part of Hoopwright is for the studio team only.');
  return { userId: user.id, role: user.role };
}

/**
 * The studio's order board and the actions on one order. Mounted at /api/admin/orders before the order page's
 * router, which answers GET /:number.
 */
export function createStudioOrdersRouter(deps: StudioOrdersDeps): Router {
  const router = Router();
  const payments = createOrderPaymentService(deps);
  const production = createOrderProductionSteps(deps);
  const proofs = createProofService(deps);
  const today = () => deps.now().toISOString().slice(0, 10);
  const numberOf = (res: { locals: Record<string, unknown> }) =>
    (res.locals.params as z.infer<typeof orderNumberParams>).number;
  // A photo comes as multipart with its fields; a render request is plain JSON.
  const photoUpload = singleUpload(deps.uploadMaxBytes);
  const optionalPhoto: RequestHandler = (req, res, next) =>
    req.is('multipart/form-data') ? photoUpload(req, res, next) : next();

  router.get('/', validate(orderBoardQuery, 'query'), async (_req, res) => {
    res.json(await listBoardOrders(deps.db, res.locals.query as OrderBoardQuery, today()));
  });

  router.get('/due', validate(dueOrdersQuery, 'query'), async (_req, res) => {
    const range = res.locals.query as DueOrdersQuery;
    res.json({ ...range, today: today(), orders: await listDueOrders(deps.db, range, today()) });
  });

  router.post(
    '/:number/proofs',
    validate(orderNumberParams, 'params'),
    optionalPhoto,
    validate(sendProofRequest),
    async (req, res) => {
      sendResult(res, await proofs.send(numberOf(res), req.body, req.file?.buffer, actorOf(req)), 201);
    },
  );

  router.get('/:number/proofs/preview', validate(orderNumberParams, 'params'), async (_req, res) => {
    const image = await proofs.preview(numberOf(res));
    if (!image.ok) return sendResult(res, image);
    res.type('image/png').send(image.value);
  });

  router.get('/:number/proofs/:version/image', validate(proofImageParams, 'params'), async (_req, res) => {
    const { number, version } = res.locals.params as z.infer<typeof proofImageParams>;
    const image = await proofs.image(number, version);
    if (!image.ok) return sendResult(res, image);
    res.set('Cache-Control', 'private, max-age=3600').type('image/png').send(image.value);
  });

  router.post('/:number/capture', validate(orderNumberParams, 'params'), async (req, res) => {
    sendResult(res, await payments.capture(numberOf(res), actorOf(req)));
  });

  router.post(
    '/:number/cancel',
    validate(orderNumberParams, 'params'),
    validate(cancelOrderRequest),
    async (req, res) => {
      sendResult(res, await payments.cancel(numberOf(res), req.body, actorOf(req)));
    },
  );

  router.post(
    '/:number/refunds',
    validate(orderNumberParams, 'params'),
    validate(refundOrderRequest),
    async (req, res) => {
      sendResult(res, await payments.refund(numberOf(res), req.body, actorOf(req)));
    },
  );

  router.post('/:number/stitched', validate(orderNumberParams, 'params'), async (req, res) => {
    sendResult(res, await production.markStitched(numberOf(res), actorOf(req)));
  });

  router.post(
    '/:number/shipped',
    validate(orderNumberParams, 'params'),
    validate(shipOrderRequest),
    async (req, res) => {
      sendResult(res, await production.ship(numberOf(res), req.body, actorOf(req)));
    },
  );

  return router;
}
