import type { RequestHandler } from 'express';
import { StripeApiError } from './api-error.ts';
import type { IdempotentResponse } from './fake-stripe-state.ts';

/**
 * Honours `Idempotency-Key` on POSTs: the same key on the same path with the same parameters replays the first
 * answer, while reusing a key elsewhere or with other parameters is an `idempotency_error`, as on Stripe. Only
 * successful answers are kept, so a request that failed validation can be corrected and sent again.
 */
export function honourIdempotencyKeys(store: Map<string, IdempotentResponse>): RequestHandler {
  return (req, res, next) => {
    const key = req.get('idempotency-key');
    if (req.method !== 'POST' || !key) return next();
    const path = req.originalUrl.split('?')[0];
    const paramsFingerprint = JSON.stringify(req.body ?? {});
    const earlier = store.get(key);
    if (earlier) {
      if (earlier.path !== path || earlier.paramsFingerprint !== paramsFingerprint) {
        throw new StripeApiError(
          400,
          'idempotency_error',
          `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.`,
        );
      }
      res.status(earlier.statusCode).set('Idempotent-Replayed', 'true').type('application/json').send(earlier.body);
      return;
    }
    const sendJson = res.json.bind(res);
    res.json = (body: unknown) => {
      if (res.statusCode < 400)
        store.set(key, { path, paramsFingerprint, statusCode: res.statusCode, body: JSON.stringify(body) });
      return sendJson(body);
    };
    next();
  };
}
