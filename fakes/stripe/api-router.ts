import express, { Router } from 'express';
import { requireApiKey } from './api-auth.ts';
import { invalidRequest, stripeApiErrorHandler } from './api-error.ts';
import { createCheckoutSessionsRouter } from './checkout-sessions.ts';
import { createCustomersRouter } from './customers.ts';
import { expireLapsedHolds } from './hold-expiry.ts';
import type { FakeStripeContext } from './fake-stripe-context.ts';
import { honourIdempotencyKeys } from './idempotency.ts';
import { createPaymentIntentsRouter } from './payment-intents.ts';
import { createRefundsRouter } from './refunds.ts';

/** The `/v1` REST API: Stripe's form-encoded bodies with bracket notation, parsed into nested objects. */
export function createApiRouter(ctx: FakeStripeContext, apiKey: string): Router {
  const router = Router();
  router.use((_req, res, next) => {
    res.set('Request-Id', ctx.nextId('req'));
    next();
  });
  router.use(requireApiKey(apiKey));
  router.use(express.urlencoded({ extended: true, limit: '1mb' }));
  router.use((_req, _res, next) => {
    expireLapsedHolds(ctx);
    next();
  });
  router.use(honourIdempotencyKeys(ctx.state.idempotentResponses));
  router.use(createCustomersRouter(ctx));
  router.use('/checkout/sessions', createCheckoutSessionsRouter(ctx));
  router.use('/payment_intents', createPaymentIntentsRouter(ctx));
  router.use('/refunds', createRefundsRouter(ctx));
  router.use((req) => {
    throw invalidRequest(`Unrecognized request URL (${req.method}: ${req.originalUrl.split('?')[0]}).`);
  });
  router.use(stripeApiErrorHandler);
  return router;
}
