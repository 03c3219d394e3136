import { Strategy as GoogleStrategy, type Profile, type VerifyCallback } from 'passport-google-oauth20';
import type { AppConfig } from '../../config.ts';
import type { UserService } from './user-service.ts';
import { createOAuthStateCookieStore } from '../../auth/oauth-state-cookie.ts';

/**
 * The Google sign-in strategy. With GOOGLE_OAUTH_BASE_URL set (development and tests) the same strategy talks to the
 * local provider in fakes/google-oauth; the `/userinfo` path keeps passport's OpenID profile parser.
 */
export function createGoogleStrategy(config: AppConfig, users: UserService): GoogleStrategy {
  const base = config.google.providerBaseUrl?.replace(/\/$/, '');
  return new GoogleStrategy(
    {
      clientID: config.google.clientId,
      clientSecret: config.google.clientSecret,
      callbackURL: `${config.appOrigin}/api/auth/google/callback`,
      scope: ['openid', 'email', 'profile'],
      // The attempt's state lives in a signed cookie, not the session: starting a sign-in stores no session.
      // passport-oauth2 calls a store by its arity; its types only list the two- and three-argument forms.
      store: createOAuthStateCookieStore(config.isCookieSecure) as never,
      ...(base
        ? { authorizationURL: `${base}/authorize`, tokenURL: `${base}/token`, userProfileURL: `${base}/userinfo` }
        : {}),
    },
    (_accessToken: string, _refreshToken: string, profile: Profile, done: VerifyCallback) => {
      const email = profile.emails?.[0];
      users
        .signIn({
          googleSub: profile.id,
          email: email?.value,
          isEmailVerified: (email as { verified?: boolean | string } | undefined)?.verified !== false,
          name: profile.displayName,
        })
        .then(
          (result) => (result.ok ? done(null, result.value as Express.User) : done(null, false, result.error as never)),
          done,
        );
    },
  );
}
