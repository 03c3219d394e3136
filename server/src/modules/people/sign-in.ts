import passport from 'passport';
import type { AppConfig } from '../../config.ts';
import type { CurrentUser } from '../../contracts/users.ts';
import { createGoogleStrategy } from './google-strategy.ts';
import type { UserService } from './user-service.ts';

/** One app instance's own passport: its Google strategy and how a session names its person. No process global. */
export function createSignIn(config: AppConfig, users: UserService): passport.Authenticator {
  const signIn = new passport.Passport();
  signIn.use(createGoogleStrategy(config, users));
  signIn.serializeUser((user, done) => done(null, (user as CurrentUser).id));
  signIn.deserializeUser((id: number, done) => {
    users.findById(id).then((user) => done(null, user ?? false), done);
  });
  return signIn;
}
