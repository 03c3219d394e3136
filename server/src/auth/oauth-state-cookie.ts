import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request } from 'express';

/** The signed cookie that carries a sign-in attempt from its start to the provider's callback. */
export const OAUTH_STATE_COOKIE = 'hw.signin';
const cookiePath = '/api/auth/google';
const maxAgeMs = 10 * 60_000;

interface AttemptState {
  /** The state sent to the provider, which must come back unchanged. */
  nonce: string;
  returnTo: string;
}

/** Where the browser goes after signing in, as the callback reads it from the state store. */
export interface SignInAppState {
  returnTo?: string;
}

type Stored = (error: Error | null, state?: string) => void;
type Verified = (error: Error | null, ok: boolean, state?: SignInAppState | { message: string }) => void;

/**
 * A state store for passport-oauth2 that keeps the attempt in a short-lived signed, httpOnly cookie instead of the
 * session, so starting a sign-in writes no session row: a visitor gets a session only once there is something to
 * keep (an account, an upload). The cookie is SameSite=Lax, which browsers send on the provider's top-level
 * redirect back, and it is cleared when the callback reads it. Needs cookie-parser with the session secret.
 */
export function createOAuthStateCookieStore(isSecure: boolean) {
  return {
    store(req: Request, appState: SignInAppState | undefined, _meta: unknown, done: Stored): void {
      const attempt: AttemptState = {
        nonce: randomBytes(18).toString('base64url'),
        returnTo: appState?.returnTo ?? '/',
      };
      req.res!.cookie(OAUTH_STATE_COOKIE, JSON.stringify(attempt), {
        signed: true,
        httpOnly: true,
        sameSite: 'lax',
        secure: isSecure,
        maxAge: maxAgeMs,
        path: cookiePath,
      });
      done(null, attempt.nonce);
    },
    verify(req: Request, providedState: unknown, _meta: unknown, done: Verified): void {
      const raw: unknown = req.signedCookies?.[OAUTH_STATE_COOKIE];
      req.res!.clearCookie(OAUTH_STATE_COOKIE, { path: cookiePath });
      const attempt = typeof raw === 'string' ? parseAttempt(raw) : undefined;
      if (!attempt || typeof providedState !== 'string' || !sameText(attempt.nonce, providedState))
        return done(null, false, { message: 'Unable to verify authorization request state.' });
      done(null, true, { returnTo: attempt.returnTo });
    },
  };
}

function parseAttempt(raw: string): AttemptState | undefined {
  try {
    const value = JSON.parse(raw) as Partial<AttemptState>;
    return typeof value.nonce === 'string' && typeof value.returnTo === 'string'
      ? { nonce: value.nonce, returnTo: value.returnTo }
      : undefined;
  } catch {
    return undefined;
  }
}

function sameText(a: string, b: string): boolean {
  const left = Buffer.from(a);
  const right = Buffer.from(b);
  return left.length === right.length && timingSafeEqual(left, right);
}
