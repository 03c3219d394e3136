import type { RequestHandler } from 'express';

/**
 * One line per API request once it is answered: request id, method, path, status and time taken. Query strings are
 * left out because sign-in callbacks carry one-time codes in them.
 */
export function accessLog(log: (line: string) => void): RequestHandler {
  return (req, res, next) => {
    const startedAt = process.hrtime.bigint();
    res.on('finish', () => {
      const ms = Number(process.hrtime.bigint() - startedAt) / 1e6;
      log(
        `[${res.locals.requestId}] ${req.method} ${req.originalUrl.split('?')[0]} ${res.statusCode} ${ms.toFixed(1)}ms`,
      );
    });
    next();
  };
}
