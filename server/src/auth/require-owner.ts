import type { RequestHandler } from 'express';
import { HttpError } from '../middleware/http-error.ts';
import { roleWords } from '../contracts/users.ts';
import { currentUserOf } from './roles.ts';

/**
 * For routes behind the studio guard that only the owner may use: staff get a 403 that says what they tried and
 * who can do it, rather than the studio guard's general refusal.
 */
export function requireOwner(action: string): RequestHandler {
  return (req, _res, next) => {
    const user = currentUserOf(req);
    if (!user) throw new HttpError('unauthenticated', 'Please sign in to continue.');
    if (user.role !== 'owner')
      throw new HttpError('forbidden', `Only the ${roleWords.owner.toLowerCase()} can ${action}.`);
    next();
  };
}
