import { Router, type Request } from 'express';
import { currentUserOf, requireSignIn } from '../../auth/roles.ts';
import { orderNumberParam, placeOrderRequest, proofAnswerRequest, proofParams } from '../../contracts/orders.ts';
import { validated } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import type { CheckoutService } from './checkout-service.ts';
import type { CustomerOrderService } from './customer-order-service.ts';

/** requireSignIn runs first on this router, so there always is a user. */
const userOf = (req: Request) => currentUserOf(req)!;

const byNumber = { params: orderNumberParam };

/**
 * The customer's orders: checkout, their orders and proofs, paying again and cancelling. Signed in only, and each
 * person reaches only their own orders (the studio's proof pictures aside, which staff may open too).
 */
export function createOrdersRouter(deps: { checkout: CheckoutService; customerOrders: CustomerOrderService }): Router {
  const router = Router();
  router.use(requireSignIn);
  router.post(
    '/',
    validated({ body: placeOrderRequest }, async ({ body }, req, res) => {
      sendResult(res, await deps.checkout.place(userOf(req), body), 201);
    }),
  );
  router.get('/', async (req, res) => {
    sendResult(res, await deps.customerOrders.list(userOf(req).id));
  });
  router.get(
    '/:number',
    validated(byNumber, async ({ params }, req, res) => {
      sendResult(res, await deps.customerOrders.get(userOf(req).id, params.number));
    }),
  );
  router.post(
    '/:number/payment',
    validated(byNumber, async ({ params }, req, res) => {
      sendResult(res, await deps.checkout.openPayment(userOf(req), params.number), 201);
    }),
  );
  router.post(
    '/:number/cancel',
    validated(byNumber, async ({ params }, req, res) => {
      sendResult(res, await deps.checkout.cancel(userOf(req), params.number));
    }),
  );
  router.get(
    '/:number/proofs/:version/image',
    validated({ params: proofParams }, async ({ params }, req, res) => {
      const image = await deps.customerOrders.proofImage(userOf(req), params.number, params.version);
      if (!image.ok) return sendResult(res, image);
      res.set('Cache-Control', 'private, max-age=300').type('png').send(image.value);
    }),
  );
  for (const [path, isApproval] of [
    ['approval', true],
    ['change-request', false],
  ] as const) {
    router.post(
      `/:number/proofs/:version/${path}`,
      validated({ params: proofParams, body: proofAnswerRequest }, async ({ params, body }, req, res) => {
        sendResult(
          res,
          await deps.customerOrders.answerProof(userOf(req), params.number, params.version, isApproval, body),
        );
      }),
    );
  }
  return router;
}
