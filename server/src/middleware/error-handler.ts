import type { ErrorRequestHandler, RequestHandler } from 'express';
import { MulterError } from 'multer';
import { HttpError, statusByKind } from './http-error.ts';

interface BodyParserError {
  type?: string;
  status?: number;
}

function fromBodyParser(error: unknown): HttpError | undefined {
  const e = error as BodyParserError;
  if (e?.type === 'entity.parse.failed') return new HttpError('invalid', 'The request body is not valid JSON.');
  if (e?.type === 'entity.too.large') return new HttpError('too-large', 'The request is too large.');
  if (e?.type === 'encoding.unsupported' || e?.type === 'charset.unsupported') {
    return new HttpError('unsupported-type', 'The request body uses an encoding this server does not accept.');
  }
  return undefined;
}

function fromUpload(error: unknown): HttpError | undefined {
  if (!(error instanceof MulterError)) return undefined;
  if (error.code === 'LIMIT_FILE_SIZE') return new HttpError('too-large', 'That file is too large.');
  return new HttpError('invalid', `The upload was not accepted: ${error.message}.`);
}

// MariaDB's ER_DUP_ENTRY on a unique key that holds an id the payment service minted.
const DUPLICATE_KEY = 1062;
const providerIdKey = /payments_(checkout_session_id|payment_intent_id)_unique/;

/** The payment service handed out an id another order already has: the provider's fault, told as a sentence. */
function fromProviderIdClash(error: unknown): HttpError | undefined {
  const e = error as { errno?: number; sqlMessage?: string };
  if (e?.errno !== DUPLICATE_KEY || !providerIdKey.test(e.sqlMessage ?? '')) return undefined;
  return new HttpError(
    'conflict',
    'The payment service gave this payment a reference that another order already has, so the payment page could not be opened. Nothing was charged: try paying again from your order page, and tell the shop if it happens again.',
  );
}

export const notFoundHandler: RequestHandler = (req) => {
  throw new HttpError('not-found', `There is nothing at ${req.method} ${req.path}.`);
};

/** Expected failures answer with their kind's status; anything else is a bug, logged with the request id, and 500. */
export function createErrorHandler(log: (line: string) => void): ErrorRequestHandler {
  return (error, req, res, next) => {
    if (res.headersSent) return next(error);
    const clash = fromProviderIdClash(error);
    if (clash) log(`[${res.locals.requestId ?? '-'}] ${req.method} ${req.originalUrl}: ${(error as Error).message}`);
    const known = error instanceof HttpError ? error : (fromBodyParser(error) ?? fromUpload(error) ?? clash);
    if (known) {
      res.status(statusByKind[known.kind]).json({
        error: { kind: known.kind, message: known.message, ...(known.fields ? { fields: known.fields } : {}) },
      });
      return;
    }
    log(
      `[${res.locals.requestId ?? '-'}] ${req.method} ${req.originalUrl} failed: ${(error as Error)?.stack ?? error}`,
    );
    res.status(500).json({
      error: { kind: 'server', message: 'Something went wrong on our side. Please try again in a moment.' },
    });
  };
}
