import { createHash, timingSafeEqual } from 'node:crypto';
import type { RequestHandler } from 'express';
import { StripeApiError } from './api-error.ts';

function digest(value: string): Buffer {
  return createHash('sha256').update(value).digest();
}

/** Requires `Authorization: Bearer <secret key>`, answering 401 in Stripe's words otherwise. */
export function requireApiKey(apiKey: string): RequestHandler {
  const expected = digest(apiKey);
  return (req, _res, next) => {
    const presented = /^Bearer (.+)$/.exec(req.get('authorization') ?? '')?.[1];
    if (!presented) {
      throw new StripeApiError(
        401,
        'invalid_request_error',
        'You did not provide an API key. Provide it in the Authorization header, using Bearer auth (e.g. "Authorization: Bearer YOUR_SECRET_KEY").',
      );
    }
    // Hashing first gives equal-length buffers, so the comparison runs in constant time whatever was sent.
    if (!timingSafeEqual(digest(presented), expected)) {
      const shown = presented.length > 12 ? `${presented.slice(0, 8)}****${presented.slice(-4)}` : '****';
      throw new StripeApiError(401, 'invalid_request_error', `Invalid API Key provided: ${shown}`);
    }
    next();
  };
}
