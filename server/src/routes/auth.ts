import { Router } from 'express';
import passport from 'passport';
import { z } from 'zod';
import { returnToPath } from '../contracts/users.ts';
import { validate } from '../middleware/validate.ts';

declare module 'express-session' {
  interface SessionData {
    returnTo?: string;
  }
}

const startQuery = z.object({ returnTo: returnToPath.optional() });

/** Sign-in with Google (or the local stand-in), and sign-out. */
export function createAuthRouter(): Router {
  const router = Router();

  router.get('/google', validate(startQuery, 'query'), (req, res, next) => {
    req.session.returnTo = (res.locals.query as z.infer<typeof startQuery>).returnTo ?? '/';
    passport.authenticate('google', { prompt: 'select_account' } as never)(req, res, next);
  });

  router.get('/google/callback', (req, res, next) => {
    // The custom callback reads returnTo before req.logIn regenerates the session (which drops its old contents).
    passport.authenticate('google', (error: unknown, user: Express.User | false, info?: { message?: string }) => {
      if (error) return next(error);
      const returnTo = req.session.returnTo ?? '/';
      if (!user) {
        const reason = encodeURIComponent(info?.message ?? 'Sign-in was cancelled or did not complete.');
        return res.redirect(`/sign-in?problem=${reason}`);
      }
      req.logIn(user, (loginError) => (loginError ? next(loginError) : res.redirect(returnTo)));
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
