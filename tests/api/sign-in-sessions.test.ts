import { describe, expect, it } from 'vitest';
import { useApiHarness } from '../support/api-harness.ts';

const harness = useApiHarness();

const sessionRows = async () => Number((await harness.db('sessions').count({ n: '*' }))[0]!.n);
const setCookies = (res: { headers: Record<string, unknown> }) => [res.headers['set-cookie'] ?? []].flat() as string[];

describe('GET /api/auth/google', () => {
  it('when visitors start signing in, then no session row is stored and no session cookie is set', async () => {
    const before = await sessionRows();
    for (let i = 0; i < 5; i += 1) {
      const res = await harness.agent().get('/api/auth/google?returnTo=/orders').expect(302);
      expect(setCookies(res).some((cookie) => cookie.startsWith('hw.sid='))).toBe(false);
      expect(setCookies(res).some((cookie) => /^hw\.signin=.*HttpOnly/i.test(cookie))).toBe(true);
    }
    expect(await sessionRows()).toBe(before);
  });

  it('when the sign-in finishes, then the person lands on the page they started from, with a session', async () => {
    const before = await sessionRows();
    const agent = harness.agent();
    expect(await harness.signIn(agent, 'priya@example.test', '/orders')).toBe('/orders');
    await agent.get('/api/me').expect(200);
    expect(await sessionRows()).toBe(before + 1);
  });

  it('when the callback arrives without the cookie its start set, then sign-in did not finish and no one is signed in', async () => {
    const start = await harness.agent().get('/api/auth/google').expect(302);
    const state = new URL(start.headers.location!).searchParams.get('state');
    const other = harness.agent();
    const res = await other.get(`/api/auth/google/callback?code=made-up&state=${state}`).expect(302);
    expect(res.headers.location).toMatch(/^\/sign-in\?problem=Sign-in%20did%20not%20finish/);
    await other.get('/api/me').expect(401);
  });
});
