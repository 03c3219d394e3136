import express from 'express';
import session from 'express-session';
import passport from 'passport';
import { Strategy as GoogleStrategy, type Profile } from 'passport-google-oauth20';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startGoogleOAuthFake } from '../../../fakes/google-oauth/server.ts';

// The real passport-google-oauth20 strategy pointed at the fake with authorizationURL, tokenURL and userProfileURL,
// as ../shared/docs/stack-notes.md §4 verified; a `/userinfo` path selects the strategy's OpenID profile parser.
const wren = {
  sub: '100000000000000000201',
  email: 'wren@wren-bobbin.test',
  name: 'Wren Hollis',
  givenName: 'Wren',
  familyName: 'Hollis',
};
const callbackURL = 'http://127.0.0.1:3999/auth/google/callback';

let fake: Awaited<ReturnType<typeof startGoogleOAuthFake>>;
let app: express.Express;

beforeAll(async () => {
  fake = await startGoogleOAuthFake({ port: 0, identities: [wren] });
  const authenticator = new passport.Passport();
  authenticator.use(
    new GoogleStrategy(
      {
        clientID: 'hoopwright-test',
        clientSecret: 'hoopwright-test-secret',
        callbackURL,
        state: true,
        authorizationURL: `${fake.url}/authorize`,
        tokenURL: `${fake.url}/token`,
        userProfileURL: `${fake.url}/userinfo`,
      },
      (
        _accessToken: string,
        _refreshToken: string,
        profile: Profile,
        done: (error: unknown, user?: Express.User) => void,
      ) =>
        done(null, { id: profile.id, name: profile.displayName, emails: profile.emails, provider: profile.provider }),
    ),
  );
  authenticator.serializeUser((user, done) => done(null, user));
  authenticator.deserializeUser((user: Express.User, done) => done(null, user));

  app = express();
  app.use(session({ secret: 'fake-oauth-test-secret', resave: false, saveUninitialized: false }));
  app.use(authenticator.session());
  app.get('/auth/google', authenticator.authenticate('google', { scope: ['openid', 'email', 'profile'] }));
  app.get(
    '/auth/google/callback',
    authenticator.authenticate('google', { failureRedirect: '/failed' }),
    (_req, res) => {
      res.redirect('/me');
    },
  );
  app.get('/me', (req, res) => {
    if (req.user) res.json(req.user);
    else res.status(401).json({ error: 'signed out' });
  });
});
afterAll(() => fake.close());

describe('passport-google-oauth20 against the fake', () => {
  it('when a person is picked on the fake page, then the strategy signs them in with the OpenID profile', async () => {
    const agent = request.agent(app);
    const start = await agent.get('/auth/google').expect(302);
    const authorizeUrl = new URL(start.headers.location);
    expect(`${authorizeUrl.origin}${authorizeUrl.pathname}`).toBe(`${fake.url}/authorize`);

    const page = await fetch(authorizeUrl);
    expect(await page.text()).toContain('Wren Hollis');
    const decision = await fetch(`${fake.url}/authorize`, {
      method: 'POST',
      body: new URLSearchParams({ ...Object.fromEntries(authorizeUrl.searchParams), identity: wren.sub }),
      redirect: 'manual',
    });
    const callback = new URL(decision.headers.get('location')!);
    expect(`${callback.origin}${callback.pathname}`).toBe(callbackURL);

    await agent.get(`${callback.pathname}${callback.search}`).expect(302).expect('Location', '/me');
    const me = await agent.get('/me').expect(200);
    expect(me.body).toEqual({
      id: wren.sub,
      name: 'Wren Hollis',
      emails: [{ value: wren.email, verified: true }],
      provider: 'google',
    });
  });
});
