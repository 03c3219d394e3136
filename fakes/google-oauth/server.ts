import express, { type Request, type Response } from 'express';
import { z } from 'zod';
import { DEFAULT_FAKE_HOST, serveHttpOnLoopback } from '../loopback-server.ts';
import {
  authorizationRequestSchema,
  clientRedirectUrl,
  typedIdentitySchema,
  type AuthorizationRequest,
} from './authorization-request.ts';
import { sendAuthorizeErrorPage, sendAuthorizePage } from './authorize-page.ts';
import { fakeIdentityListSchema, identityForEmail, toUserinfo, type FakeIdentity } from './fake-identity.ts';
import { createGrantStore } from './grant-store.ts';

export type { FakeIdentity } from './fake-identity.ts';

const tokenRequestSchema = z.object({
  grant_type: z.string().optional(),
  code: z.string().optional(),
  redirect_uri: z.string().optional(),
  client_id: z.string().optional(),
  client_secret: z.string().optional(),
});

/** Parses the authorization request, or answers with a readable 400 page (never a redirect to an unchecked URL). */
function readAuthorizationRequest(params: unknown, res: Response): AuthorizationRequest | undefined {
  const parsed = authorizationRequestSchema.safeParse(params);
  if (!parsed.success) {
    sendAuthorizeErrorPage(
      res,
      parsed.error.issues.map((issue) => issue.message),
    );
    return undefined;
  }
  if (parsed.data.response_type !== 'code') {
    // The redirect URI is sound, so RFC 6749 §4.1.2.1 says to report the error to the client.
    res.redirect(302, clientRedirectUrl(parsed.data, { error: 'unsupported_response_type' }));
    return undefined;
  }
  return parsed.data;
}

function tokenError(res: Response, status: number, error: string, description: string): void {
  res.status(status).set('Cache-Control', 'no-store').json({ error, error_description: description });
}

function bearerToken(req: Request): string | undefined {
  if (typeof req.query.access_token === 'string') return req.query.access_token;
  return /^Bearer (\S+)$/i.exec(req.get('authorization') ?? '')?.[1];
}

/**
 * A local OAuth 2.0 provider speaking Google's authorization-code flow over HTTP, for passport-google-oauth20
 * pointed at it through `authorizationURL`, `tokenURL` and `userProfileURL` (`/authorize`, `/token`, `/userinfo`).
 */
export async function startGoogleOAuthFake(opts: {
  port: number;
  host?: string;
  identities: FakeIdentity[];
}): Promise<{ url: string; close(): Promise<void> }> {
  const identities = fakeIdentityListSchema.parse(opts.identities);
  const grants = createGrantStore();
  const app = express();
  app.disable('x-powered-by');
  app.use(express.urlencoded({ extended: false, limit: '16kb' }));

  app.get('/authorize', (req, res) => {
    const request = readAuthorizationRequest(req.query, res);
    if (request) sendAuthorizePage(res, { request, identities });
  });

  app.post('/authorize', (req, res) => {
    const request = readAuthorizationRequest(req.body, res);
    if (!request) return;
    const chosenSub: unknown = req.body.identity;
    let identity: FakeIdentity | undefined;
    if (typeof chosenSub === 'string') {
      identity = identities.find((person) => person.sub === chosenSub);
      if (!identity) {
        sendAuthorizePage(
          res,
          { request, identities, alert: 'That person is no longer on the list. Pick another.' },
          400,
        );
        return;
      }
    } else {
      const typed = typedIdentitySchema.safeParse(req.body);
      if (!typed.success) {
        const fieldErrors = Object.fromEntries(
          typed.error.issues.map((issue) => [String(issue.path[0]), issue.message]),
        );
        const echo = { email: String(req.body.email ?? ''), name: String(req.body.name ?? '') };
        sendAuthorizePage(res, { request, identities, typed: echo, fieldErrors }, 400);
        return;
      }
      const email = typed.data.email.toLowerCase();
      identity =
        identities.find((person) => person.email.toLowerCase() === email) ?? identityForEmail(email, typed.data.name);
    }
    const code = grants.issueCode(identity, request.client_id, request.redirect_uri);
    res.redirect(302, clientRedirectUrl(request, { code }));
  });

  // RFC 6749 §4.1.3: client credentials arrive in the form body (passport-oauth2 sends no Basic auth).
  app.post('/token', (req, res) => {
    const body = tokenRequestSchema.safeParse(req.body ?? {});
    if (!body.success) return tokenError(res, 400, 'invalid_request', 'Every parameter must be a single string.');
    const {
      grant_type: grantType,
      code,
      redirect_uri: redirectUri,
      client_id: clientId,
      client_secret: secret,
    } = body.data;
    if (grantType !== 'authorization_code') {
      return tokenError(res, 400, 'unsupported_grant_type', 'Only grant_type=authorization_code is supported.');
    }
    if (!clientId || !secret)
      return tokenError(res, 401, 'invalid_client', 'client_id and client_secret are required.');
    if (!code) return tokenError(res, 400, 'invalid_request', 'code is missing.');
    const redemption = grants.redeemCode(code, clientId, redirectUri);
    if (!redemption.ok) return tokenError(res, 400, 'invalid_grant', redemption.description);
    res.set({ 'Cache-Control': 'no-store', Pragma: 'no-cache' });
    res.json({ access_token: redemption.accessToken, token_type: 'Bearer', expires_in: 3600 });
  });

  app.get('/userinfo', (req, res) => {
    const token = bearerToken(req);
    const identity = token ? grants.identityForToken(token) : undefined;
    if (!identity) {
      // Google's error body; passport-google-oauth20 turns `{error:{message,code}}` into a GooglePlusAPIError.
      res
        .status(401)
        .set('WWW-Authenticate', 'Bearer error="invalid_token"')
        .json({
          error: { code: 401, message: 'Request had invalid authentication credentials.', status: 'UNAUTHENTICATED' },
        });
      return;
    }
    res.json(toUserinfo(identity));
  });

  return serveHttpOnLoopback(app, opts.port, opts.host ?? DEFAULT_FAKE_HOST);
}
