import type { IncomingMessage, ServerResponse } from 'node:http';
import type { RequestHandler } from 'express';
import helmet from 'helmet';
import type { AppConfig } from '../config.ts';

/** helmet's settings for both apps and the API: the apps' own files only, no framing, HSTS behind HTTPS. */
function helmetFor(config: Pick<AppConfig, 'isCookieSecure'>) {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        fontSrc: ["'self'", 'data:'],
        connectSrc: ["'self'"],
        formAction: ["'self'"],
        frameAncestors: ["'none'"],
        objectSrc: ["'none'"],
        baseUri: ["'self'"],
        ...(config.isCookieSecure ? { upgradeInsecureRequests: [] } : {}),
      },
    },
    strictTransportSecurity: config.isCookieSecure,
  });
}

/**
 * The security headers helmet sets, worked out once at start and set on every answer in one step. With these
 * settings helmet's headers never depend on the request (no nonces), so running its dozen middlewares per request
 * only cost time on every price check; `helmet-headers` tests that the two give the same headers.
 */
export function securityHeaders(config: Pick<AppConfig, 'isCookieSecure'>): RequestHandler {
  const headers: [string, string][] = [];
  const recorder = {
    setHeader(name: string, value: string) {
      headers.push([name, String(value)]);
    },
    removeHeader() {},
  };
  helmetFor(config)({} as IncomingMessage, recorder as unknown as ServerResponse, () => undefined);
  return (_req, res, next) => {
    for (const [name, value] of headers) res.setHeader(name, value);
    next();
  };
}

/** helmet itself, per request, with the same settings (for the test that compares the two). */
export const helmetPerRequest = helmetFor;
