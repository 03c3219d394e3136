import type { RequestHandler } from 'express';
import { HttpError } from './http-error.ts';

const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Refuses state-changing requests that a browser sent from another site. SameSite=Lax cookies alone still let a
 * top-level cross-site form POST through on some browsers, so the Origin header (or, failing that, the Referer) must
 * name this app's own origin. Requests without either are refused too: every browser sends Origin on a POST.
 */
export function requireSameOrigin(appOrigin: string): RequestHandler {
  return (req, _res, next) => {
    if (safeMethods.has(req.method)) return next();
    const origin = req.get('origin') ?? originOf(req.get('referer'));
    if (origin !== appOrigin) {
      throw new HttpError(
        'forbidden',
        'This request did not come from the Hoopwright site, so it was refused. Reload the page and try again.',
      );
    }
    next();
  };
}

function originOf(url: string | undefined): string | undefined {
  if (!url) return undefined;
  try {
    return new URL(url).origin;
  } catch {
    return undefined;
  }
}
