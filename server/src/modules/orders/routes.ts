import { Router, type Request } from 'express';
import type { z } from 'zod';
import { currentUserOf, requireSignIn } from '../../auth/roles.ts';
import { orderNumberParam, placeOrderRequest, proofAnswerRequest, proofParams } from '../../contracts/orders.ts';
import { validate } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import type { CheckoutService } from './checkout-service.ts';
import type { CustomerOrderService } from './customer-order-service.ts';

type NumberParams = z.infer<typeof orderNumberParam>;
type ProofParams = z.infer<typeof proofParams>;

/** requireSignIn runs first on this router, so there always is a user. */
const userOf = (req: Request) => currentUserOf(req)!;

/**
 * The customer's orders: checkout, their orders and proofs, paying again and cancelling. Signed in only, and each
 * person reaches only their own orders (the studio's proof pictures aside, which staff may open too).
 */
export function createOrdersRouter(deps: { checkout: CheckoutService; customerOrders: CustomerOrderService }): Router {
  const router = Router();
  router.use(requireSignIn);
  router.post('/', validate(placeOrderRequest), async (req, res) => {
    sendResult(res, await deps.checkout.place(userOf(req), req.body), 201);
  });
  router.get('/', async (req, res) => {
    sendResult(res, await deps.customerOrders.list(userOf(req).id));
  });
  router.get('/:number', validate(orderNumberParam, 'params'), async (req, res) => {
    const { number } = res.locals.params as NumberParams;
    sendResult(res, await deps.customerOrders.get(userOf(req).id, number));
  });
  router.post('/:number/payment', validate(orderNumberParam, 'params'), async (req, res) => {
    const { number } = res.locals.params as NumberParams;
    sendResult(res, await deps.checkout.openPayment(userOf(req), number), 201);
  });
  router.post('/:number/cancel', validate(orderNumberParam, 'params'), async (req, res) => {
    const { number } = res.locals.params as NumberParams;
    sendResult(res, await deps.checkout.cancel(userOf(req), number));
  });
  router.get('/:number/proofs/:version/image', validate(proofParams, 'params'), async (req, res) => {
    const { number, version } = res.locals.params as ProofParams;
    const image = await deps.customerOrders.proofImage(userOf(req), number, version);
    if (!image.ok) return sendResult(res, image);
    res.set('Cache-Control', 'private, max-age=300').type('png').send(image.value);
  });
  router.post(
    '/:number/proofs/:version/approval',
    validate(proofParams, 'params'),
    validate(proofAnswerRequest),
    async (req, res) => {
      const { number, version } = res.locals.params as ProofParams;
      sendResult(res, await deps.customerOrders.answerProof(userOf(req), number, version, true, req.body));
    },
  );
  router.post(
    '/:number/proofs/:version/change-request',
    validate(proofParams, 'params'),
    validate(proofAnswerRequest),
    async (req, res) => {
      const { number, version } = res.locals.params as ProofParams;
      sendResult(res, await deps.customerOrders.answerProof(userOf(req), number, version, false, req.body));
    },
  );
  return router;
}
