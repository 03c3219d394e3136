import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startGoogleOAuthFake } from '../../../fakes/google-oauth/server.ts';

// The authorization-code flow as RFC 6749 §4.1 describes it, with the token and userinfo shapes that
// passport-google-oauth20 expects (../shared/docs/stack-notes.md §4).
const maren = {
  sub: '100000000000000000101',
  email: 'maren@wren-bobbin.test',
  name: 'Maren Threadgill',
  givenName: 'Maren',
  familyName: 'Threadgill',
};
const osric = {
  sub: '100000000000000000102',
  email: 'osric@wren-bobbin.test',
  name: 'Osric Pell',
  givenName: 'Osric',
  familyName: 'Pell',
};
const client = { client_id: 'hoopwright-test', redirect_uri: 'http://127.0.0.1:3999/api/auth/google/callback' };

let fake: Awaited<ReturnType<typeof startGoogleOAuthFake>>;
beforeAll(async () => {
  fake = await startGoogleOAuthFake({ port: 0, identities: [maren, osric] });
});
afterAll(() => fake.close());

function authorizeParams(extra: Record<string, string | undefined> = {}): Record<string, string> {
  const params = { response_type: 'code', ...client, scope: 'openid email profile', state: 'st-123', ...extra };
  return Object.fromEntries(
    Object.entries(params).filter((entry): entry is [string, string] => entry[1] !== undefined),
  );
}

async function choose(choice: Record<string, string>, extra: Record<string, string> = {}): Promise<URL> {
  const response = await fetch(`${fake.url}/authorize`, {
    method: 'POST',
    body: new URLSearchParams({ ...authorizeParams(extra), ...choice }),
    redirect: 'manual',
  });
  expect(response.status).toBe(302);
  return new URL(response.headers.get('location')!);
}

async function exchange(code: string) {
  const response = await fetch(`${fake.url}/token`, {
    method: 'POST',
    body: new URLSearchParams({ grant_type: 'authorization_code', code, ...client, client_secret: 'shh' }),
  });
  return { status: response.status, body: await response.json() };
}

async function userinfo(accessToken: string) {
  const response = await fetch(`${fake.url}/userinfo?access_token=${encodeURIComponent(accessToken)}`);
  return { status: response.status, body: await response.json() };
}

describe('GET /authorize', () => {
  it('when the request is sound, then it shows one button per person and a form for a new e-mail', async () => {
    const response = await fetch(`${fake.url}/authorize?${new URLSearchParams(authorizeParams())}`);
    const page = await response.text();
    expect(response.status).toBe(200);
    expect(page).toContain('Local sign-in stand-in');
    for (const person of [maren, osric]) {
      expect(page).toMatch(
        new RegExp(`<button[^>]*name="identity" value="${person.sub}">[\\s\\S]*?${person.name}[\\s\\S]*?</button>`),
      );
    }
    expect(page).toMatch(/<input\s+id="email"\s+name="email"\s+type="email"/);
    expect(page).toMatch(/<input type="hidden" name="state" value="st-123"\s*\/?>/);
  });

  it('when the page is served, then its CSP admits only its own stylesheet and no remote resource is referenced', async () => {
    const response = await fetch(`${fake.url}/authorize?${new URLSearchParams(authorizeParams())}`);
    const csp = response.headers.get('content-security-policy')!;
    expect(csp).toMatch(/default-src 'none'; style-src 'sha256-[A-Za-z0-9+/=]+'; form-action 'self' http: https:/);
    expect(csp).not.toContain('unsafe-inline');
    expect(await response.text()).not.toMatch(/(src|href)="https?:/);
  });

  it('when values in the request carry markup, then the page shows them escaped', async () => {
    const response = await fetch(
      `${fake.url}/authorize?${new URLSearchParams(authorizeParams({ state: '"><script>alert(1)</script>' }))}`,
    );
    const page = await response.text();
    expect(page).not.toContain('<script>');
    expect(page).toContain('value="&quot;&gt;&lt;script&gt;alert(1)&lt;/script&gt;"');
  });

  it.each([
    ['redirect_uri is missing', { redirect_uri: undefined }, 'redirect_uri is missing.'],
    ['redirect_uri is empty', { redirect_uri: '' }, 'redirect_uri must be an http(s) URL.'],
    ['redirect_uri is not http(s)', { redirect_uri: 'javascript:alert(1)' }, 'redirect_uri must be an http(s) URL.'],
    ['client_id is empty', { client_id: '' }, 'client_id is empty.'],
  ])('when %s, then it answers 400 with a readable page and no redirect', async (_case, override, message) => {
    const response = await fetch(`${fake.url}/authorize?${new URLSearchParams(authorizeParams(override))}`, {
      redirect: 'manual',
    });
    expect(response.status).toBe(400);
    expect(response.headers.get('content-type')).toContain('text/html');
    expect(await response.text()).toContain(message);
  });

  it('when response_type is not code, then it sends the client an unsupported_response_type error', async () => {
    const response = await fetch(
      `${fake.url}/authorize?${new URLSearchParams(authorizeParams({ response_type: 'token' }))}`,
      {
        redirect: 'manual',
      },
    );
    const location = new URL(response.headers.get('location')!);
    expect(response.status).toBe(302);
    expect(location.searchParams.get('error')).toBe('unsupported_response_type');
    expect(location.searchParams.get('state')).toBe('st-123');
  });
});

describe('the authorization-code exchange', () => {
  it('when a listed person is picked, then code → token → userinfo returns that person', async () => {
    const callback = await choose({ identity: maren.sub });
    expect(`${callback.origin}${callback.pathname}`).toBe(client.redirect_uri);
    expect(callback.searchParams.get('state')).toBe('st-123');

    const token = await exchange(callback.searchParams.get('code')!);
    expect(token.status).toBe(200);
    expect(token.body).toEqual({ access_token: expect.any(String), token_type: 'Bearer', expires_in: 3600 });

    const profile = await userinfo(token.body.access_token);
    expect(profile.status).toBe(200);
    expect(profile.body).toEqual({
      sub: maren.sub,
      name: 'Maren Threadgill',
      given_name: 'Maren',
      family_name: 'Threadgill',
      email: maren.email,
      email_verified: true,
      picture: expect.stringMatching(/^data:image\/svg\+xml;base64,/),
    });
    const viaHeader = await fetch(`${fake.url}/userinfo`, {
      headers: { Authorization: `Bearer ${token.body.access_token}` },
    });
    expect((await viaHeader.json()).sub).toBe(maren.sub);
  });

  it('when a new e-mail is typed twice, then both sign-ins are the same person with a stable sub', async () => {
    const first = await choose({ email: 'Juniper.Ashgrove@example.test', name: '' });
    const second = await choose({ email: 'juniper.ashgrove@example.test', name: '' });
    const people = [];
    for (const callback of [first, second]) {
      const token = await exchange(callback.searchParams.get('code')!);
      people.push((await userinfo(token.body.access_token)).body);
    }
    expect(people[0].sub).toMatch(/^\d{21}$/);
    expect(people[1].sub).toBe(people[0].sub);
    expect(people[0]).toMatchObject({
      email: 'juniper.ashgrove@example.test',
      name: 'Juniper Ashgrove',
      given_name: 'Juniper',
      family_name: 'Ashgrove',
    });
  });

  it("when a listed person's e-mail is typed, then it signs in as that listed person", async () => {
    const token = await exchange(
      (await choose({ email: osric.email, name: 'Someone Else' })).searchParams.get('code')!,
    );
    expect((await userinfo(token.body.access_token)).body.sub).toBe(osric.sub);
  });

  it('when the typed e-mail is not an address, then the page comes back with the message in place', async () => {
    const response = await fetch(`${fake.url}/authorize`, {
      method: 'POST',
      body: new URLSearchParams({ ...authorizeParams(), email: 'not-an-address', name: 'X' }),
      redirect: 'manual',
    });
    const page = await response.text();
    expect(response.status).toBe(400);
    expect(page).toContain('Enter a full e-mail address');
    expect(page).toContain('value="not-an-address"');
  });

  it('when a code is used twice, then the second exchange is invalid_grant and the first token is revoked', async () => {
    const code = (await choose({ identity: osric.sub })).searchParams.get('code')!;
    const first = await exchange(code);
    const second = await exchange(code);
    expect(second).toEqual({ status: 400, body: { error: 'invalid_grant', error_description: expect.any(String) } });
    expect((await userinfo(first.body.access_token)).status).toBe(401);
  });

  it('when the code is unknown or the redirect_uri differs, then the exchange is invalid_grant', async () => {
    expect((await exchange('code-999999')).body.error).toBe('invalid_grant');
    const code = (await choose({ identity: osric.sub })).searchParams.get('code')!;
    const response = await fetch(`${fake.url}/token`, {
      method: 'POST',
      body: new URLSearchParams({
        grant_type: 'authorization_code',
        code,
        client_id: client.client_id,
        client_secret: 's',
        redirect_uri: 'http://127.0.0.1:1/other',
      }),
    });
    expect(response.status).toBe(400);
    expect((await response.json()).error).toBe('invalid_grant');
  });

  it('when the client secret is missing, then the exchange is invalid_client', async () => {
    const code = (await choose({ identity: osric.sub })).searchParams.get('code')!;
    const response = await fetch(`${fake.url}/token`, {
      method: 'POST',
      body: new URLSearchParams({ grant_type: 'authorization_code', code, ...client }),
    });
    expect(response.status).toBe(401);
    expect((await response.json()).error).toBe('invalid_client');
  });

  it("when userinfo gets a bad token, then it answers 401 in Google's error shape", async () => {
    expect(await userinfo('token-nope')).toEqual({
      status: 401,
      body: { error: { code: 401, message: expect.any(String), status: 'UNAUTHENTICATED' } },
    });
  });
});
