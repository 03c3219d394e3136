import type { Request, RequestHandler } from 'express';
import { RateLimiterRes } from 'rate-limiter-flexible';
import type { RateLimitSettings } from '../config.ts';
import type { Db } from '../db/knex.ts';
import { HttpError } from './http-error.ts';
import { OneTripRateLimiter } from './one-trip-rate-limiter.ts';

/** What each limit guards, in the words of the refusal. */
const limitedActions = {
  signIn: 'sign-in attempts',
  quotePreviews: 'price checks',
  uploads: 'uploads',
  orders: 'checkouts',
  proofAnswers: 'answers to proofs',
} as const satisfies Record<Exclude<keyof RateLimitSettings, 'windowSeconds'>, string>;

export type RateLimitName = keyof typeof limitedActions;
export type RateLimits = Record<RateLimitName, RequestHandler>;

/** A signed-in person is counted by account, anyone else by address (behind a proxy, TRUST_PROXY gives the real one). */
const clientKey = (req: Request) => {
  const user = req.user as { id?: number } | undefined;
  return user?.id ? `user-${user.id}` : `ip-${req.ip ?? 'unknown'}`;
};

/**
 * Sign-in is a page the browser opens, not a call the app makes, so a refusal there is a short page saying the same
 * sentence, with the way back, rather than JSON the person would see raw. Status and Retry-After stay as for any limit.
 */
function refusalPage(sentence: string): string {
  return [
    '<!doctype html>',
    '<html lang="en">',
    '<meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    '<title>Please wait a little · Sign in</title>',
    '<main>',
    '<h1>Please wait a little before signing in again</h1>',
    `<p>${sentence}</p>`,
    '<p><a href="/sign-in">Back to signing in</a> · <a href="/">Back to the shop</a></p>',
    '</main>',
    '</html>',
  ].join('\n');
}

const inWords = (seconds: number) =>
  seconds < 90 ? `${seconds} second${seconds === 1 ? '' : 's'}` : `${Math.ceil(seconds / 60)} minutes`;

/**
 * The abuse limits: one counter per limit and client in the `rate_limits` table (rate-limiter-flexible's MySQL
 * store over the app's knex pool, counting in one statement), so every server instance counts the same requests. A client over its limit is
 * answered 429 with `Retry-After` and a sentence saying when to try again.
 */
export function createRateLimits(db: Db, database: string, settings: RateLimitSettings): RateLimits {
  const limit = (name: RateLimitName): RequestHandler => {
    const limiter = new OneTripRateLimiter({
      storeClient: db,
      storeType: 'knex',
      dbName: database,
      tableName: 'rate_limits',
      tableCreated: true,
      keyPrefix: name,
      points: settings[name],
      duration: settings.windowSeconds,
    });
    return async (req, res, next) => {
      const refusal = await limiter.consume(clientKey(req)).then(
        () => undefined,
        (rejection: unknown) => rejection,
      );
      if (refusal === undefined) return next();
      // The store failing (the database away) is not the client's doing: it goes to the error handler.
      if (!(refusal instanceof RateLimiterRes)) return next(refusal);
      const retryAfterSeconds = Math.max(1, Math.ceil(refusal.msBeforeNext / 1000));
      res.set('Retry-After', String(retryAfterSeconds));
      const sentence = `That is more ${limitedActions[name]} than we take in a short while. Please try again in ${inWords(retryAfterSeconds)}.`;
      if (name === 'signIn' && req.accepts(['json', 'html']) === 'html') {
        res.status(429).type('html').send(refusalPage(sentence));
        return;
      }
      next(new HttpError('too-many-requests', sentence));
    };
  };
  return Object.fromEntries(
    Object.keys(limitedActions).map((name) => [name, limit(name as RateLimitName)]),
  ) as RateLimits;
}
