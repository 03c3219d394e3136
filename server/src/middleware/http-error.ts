import type { ErrorKind } from '../contracts/errors.ts';

export const statusByKind: Record<ErrorKind, number> = {
  invalid: 400,
  unauthenticated: 401,
  forbidden: 403,
  'not-found': 404,
  conflict: 409,
  'too-large': 413,
  'unsupported-type': 415,
  'payment-failed': 402,
  busy: 503,
  'too-many-requests': 429,
  'needs-acknowledgement': 422,
  unprocessable: 422,
};

/** An expected failure raised at the edge (middleware); the error handler answers it with its status and message. */
export class HttpError extends Error {
  constructor(
    readonly kind: ErrorKind,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'HttpError';
  }
}
