import { Router } from 'express';
import type passport from 'passport';
import { AuthorizationError, InternalOAuthError, TokenError } from 'passport-oauth2';
import { z } from 'zod';
import { returnToPath, type CurrentUser } from '../../contracts/users.ts';
import { validated } from '../../middleware/validate.ts';
import type { SignInAppState } from '../../auth/oauth-state-cookie.ts';

const startQuery = z.object({ returnTo: returnToPath.optional() });

const unfinished = 'Sign-in did not finish, so nothing changed. Please try again.';

/**
 * Why a sign-in attempt came back without a user, in words for the person: our own refusals (an unverified e-mail,
 * an address linked to another account) carry a kind and their message; anything from the OAuth exchange (a stale
 * or replayed callback, a cancelled consent, a mismatched state) reads as "did not finish".
 */
function problemMessage(info: unknown): string {
  const refusal = info as { kind?: string; message?: string } | undefined;
  return refusal?.kind && refusal.message ? refusal.message : unfinished;
}

/**
 * Sign-in with Google (or the local stand-in), and sign-out. `claimArtwork` hands what a visitor uploaded before
 * signing in to their account.
 */
export function createAuthRouter(deps: {
  signIn: passport.Authenticator;
  log: (line: string) => void;
  claimArtwork: (sessionKey: string, userId: number) => Promise<void>;
}): Router {
  const router = Router();

  router.get(
    '/google',
    validated({ query: startQuery }, ({ query }, req, res, next) => {
      // returnTo rides in the attempt's signed state cookie (auth/oauth-state-cookie.ts), not in a session.
      const state: SignInAppState = { returnTo: query.returnTo ?? '/' };
      deps.signIn.authenticate('google', { prompt: 'select_account', state } as never)(req, res, next);
    }),
  );

  router.get('/google/callback', (req, res, next) => {
    // The custom callback reads the visitor's upload key before req.logIn regenerates the session (which drops it).
    deps.signIn.authenticate('google', (error: unknown, user: Express.User | false, info?: unknown) => {
      const signInProblem = (message: string) => res.redirect(`/sign-in?problem=${encodeURIComponent(message)}`);
      // A code that was already used or has expired is the visitor's back button, not a fault of ours.
      if (error instanceof TokenError || error instanceof AuthorizationError) return signInProblem(unfinished);
      if (error instanceof InternalOAuthError) {
        deps.log(`Sign-in provider unreachable: ${error.message}`);
        return signInProblem('We could not reach the sign-in service just now. Please try again in a minute.');
      }
      if (error) return next(error);
      if (!user) return signInProblem(problemMessage(info));
      const returnTo = (info as { state?: SignInAppState } | undefined)?.state?.returnTo ?? '/';
      const { artworkSessionKey } = req.session;
      req.logIn(user, (loginError) => {
        if (loginError) return next(loginError);
        if (!artworkSessionKey) return res.redirect(returnTo);
        deps.claimArtwork(artworkSessionKey, (user as CurrentUser).id).then(() => res.redirect(returnTo), next);
      });
    })(req, res, next);
  });

  router.post('/sign-out', (req, res, next) => {
    req.logout((logoutError) => {
      if (logoutError) return next(logoutError);
      req.session.destroy((destroyError) => {
        if (destroyError) return next(destroyError);
        res.clearCookie('hw.sid', { path: '/' });
        res.status(204).end();
      });
    });
  });

  return router;
}
