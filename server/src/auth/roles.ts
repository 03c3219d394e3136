import type { RequestHandler } from 'express';
import type { CurrentUser, Role } from '../contracts/users.ts';
import { HttpError } from '../middleware/http-error.ts';

/** The signed-in user that passport's deserializer put on the request, if any. */
export function currentUserOf(req: Express.Request): CurrentUser | undefined {
  return req.user as CurrentUser | undefined;
}

/** 401 when nobody is signed in. */
export const requireSignIn: RequestHandler = (req, _res, next) => {
  if (!currentUserOf(req)) throw new HttpError('unauthenticated', 'Please sign in to continue.');
  next();
};

/** 401 when nobody is signed in, 403 when the signed-in user's role is not one of those allowed. */
export function requireRole(...allowed: Role[]): RequestHandler {
  return (req, _res, next) => {
    const user = currentUserOf(req);
    if (!user) throw new HttpError('unauthenticated', 'Please sign in to continue.');
    if (!allowed.includes(user.role)) {
      throw new HttpError('forbidden', 'This part of Hoopwright is for the studio team only.');
    }
    next();
  };
}
