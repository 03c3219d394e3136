import { randomUUID } from 'node:crypto';
import type { RequestHandler } from 'express';

/** Tags each request with an id (kept from X-Request-Id when a proxy set one) for the logs and the response. */
export const requestId: RequestHandler = (req, res, next) => {
  const incoming = req.get('x-request-id');
  const id = incoming && /^[\w.-]{1,100}$/.test(incoming) ? incoming : randomUUID();
  res.locals.requestId = id;
  res.set('X-Request-Id', id);
  next();
};
