import type { ErrorRequestHandler } from 'express';

type StripeErrorType = 'invalid_request_error' | 'idempotency_error' | 'api_error' | 'card_error';

/**
 * An error answered in Stripe's shape, `{ error: { type, code, message, param } }`; the SDK picks its error class
 * from the status (400/404 → StripeInvalidRequestError, 401 → StripeAuthenticationError).
 */
export class StripeApiError extends Error {
  constructor(
    readonly statusCode: number,
    readonly type: StripeErrorType,
    message: string,
    readonly details: { code?: string; param?: string } = {},
  ) {
    super(message);
  }

  toBody() {
    return { error: { type: this.type, message: this.message, ...this.details } };
  }
}

export function invalidRequest(message: string, details: { code?: string; param?: string } = {}): StripeApiError {
  return new StripeApiError(400, 'invalid_request_error', message, details);
}

export function resourceMissing(resource: string, id: string): StripeApiError {
  return new StripeApiError(404, 'invalid_request_error', `No such ${resource}: '${id}'`, {
    code: 'resource_missing',
    param: 'id',
  });
}

/** Last handler of the /v1 router: every failure leaves in Stripe's error shape. */
export const stripeApiErrorHandler: ErrorRequestHandler = (error: unknown, _req, res, _next) => {
  let apiError: StripeApiError;
  if (error instanceof StripeApiError) apiError = error;
  else if (typeof (error as { status?: unknown }).status === 'number' && (error as { status: number }).status < 500) {
    // body-parser's errors: malformed or oversized form bodies.
    apiError = invalidRequest(`Invalid request body: ${(error as Error).message}`);
  } else {
    apiError = new StripeApiError(500, 'api_error', `The fake failed: ${(error as Error).message ?? String(error)}`);
  }
  res.status(apiError.statusCode).json(apiError.toBody());
};
