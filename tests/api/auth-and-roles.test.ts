import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { useApiHarness } from '../support/api-harness.ts';

const harness = useApiHarness();

describe('GET /api/me', () => {
  it('when nobody is signed in, then it answers 401 with a message', async () => {
    const res = await request(harness.app).get('/api/me').expect(401);
    expect(res.body.error).toMatchObject({ kind: 'unauthenticated', message: expect.stringMatching(/sign in/i) });
  });

  it('when a demo customer signs in, then it returns that customer', async () => {
    const agent = harness.agent();
    await harness.signIn(agent, 'priya@example.test');
    const res = await agent.get('/api/me').expect(200);
    expect(res.body.user).toMatchObject({ email: 'priya@example.test', name: 'Priya Castellanos', role: 'customer' });
  });

  it('when a new person signs in with a typed e-mail, then they become a customer', async () => {
    const agent = harness.agent();
    await harness.signIn(agent, 'new.grandparent@example.test');
    const res = await agent.get('/api/me').expect(200);
    expect(res.body.user).toMatchObject({ email: 'new.grandparent@example.test', role: 'customer' });
  });
});

describe('sign-in session', () => {
  it('when a person signs in, then the session id changes and the cookie is httpOnly and SameSite=Lax', async () => {
    const agent = harness.agent();
    const start = await agent.get('/api/auth/google').expect(302);
    const before = String(start.headers['set-cookie']).match(/hw\.sid=([^;]+)/)?.[1];
    await harness.signIn(agent, 'priya@example.test');
    const me = await agent.get('/api/me').expect(200);
    const cookie = String(me.headers['set-cookie']);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie.match(/hw\.sid=([^;]+)/)?.[1]).not.toBe(before);
  });

  it('when a person signs out, then the session is gone', async () => {
    const agent = harness.agent();
    await harness.signIn(agent, 'priya@example.test');
    await agent.post('/api/auth/sign-out').expect(204);
    await agent.get('/api/me').expect(401);
  });

  it('when a used or made-up code comes back to the callback, then the person is sent to sign in again, not shown an error', async () => {
    const agent = harness.agent();
    const start = await agent.get('/api/auth/google').expect(302);
    const state = new URL(start.headers.location!).searchParams.get('state');
    const res = await agent.get(`/api/auth/google/callback?code=already-used&state=${state}`).expect(302);
    expect(decodeURIComponent(res.headers.location!)).toBe(
      '/sign-in?problem=Sign-in did not finish, so nothing changed. Please try again.',
    );
  });

  it('when the callback carries a state this session never issued, then it is refused the same way', async () => {
    const res = await harness.agent().get('/api/auth/google/callback?code=x&state=forged').expect(302);
    expect(res.headers.location).toMatch(/^\/sign-in\?problem=Sign-in%20did%20not%20finish/);
  });

  it('when the return path points at another host, then sign-in is refused before it starts', async () => {
    const res = await harness.agent().get('/api/auth/google?returnTo=//evil.test/x').expect(400);
    expect(res.body.error.fields.returnTo).toMatch(/path on this site/);
  });
});

describe('/api/admin/*', () => {
  it('when nobody is signed in, then it answers 401', async () => {
    await request(harness.app).get('/api/admin/overview').expect(401);
  });

  it('when a customer asks, then it answers 403', async () => {
    const agent = harness.agent();
    await harness.signIn(agent, 'priya@example.test');
    const res = await agent.get('/api/admin/overview').expect(403);
    expect(res.body.error.kind).toBe('forbidden');
  });

  it('when staff ask, then the overview lists orders by status', async () => {
    const agent = harness.agent();
    await harness.signIn(agent, 'tobias@wrenandbobbin.test');
    const res = await agent.get('/api/admin/overview').expect(200);
    expect(res.body.shopName).toMatch(/Wren & Bobbin/);
    expect(Object.keys(res.body.countsByStatus).length).toBeGreaterThanOrEqual(9);
  });

  it('when an unknown admin path is asked for by a customer, then it is still refused, not revealed', async () => {
    const agent = harness.agent();
    await harness.signIn(agent, 'priya@example.test');
    await agent.get('/api/admin/no-such-thing').expect(403);
  });
});

describe('cross-site protection', () => {
  it('when a state-changing request comes from another origin, then it is refused with 403', async () => {
    const agent = harness.agent();
    await harness.signIn(agent, 'priya@example.test');
    const res = await agent.post('/api/auth/sign-out').set('Origin', 'http://evil.test').expect(403);
    expect(res.body.error.message).toMatch(/did not come from the Hoopwright site/);
    await agent.get('/api/me').expect(200);
  });

  it('when a POST carries neither Origin nor Referer, then it is refused', async () => {
    await request(harness.app).post('/api/auth/sign-out').expect(403);
  });

  it('when responses are sent, then they carry a Content-Security-Policy and no framing', async () => {
    const res = await request(harness.app).get('/api/health').expect(200);
    expect(res.headers['content-security-policy']).toMatch(/default-src 'self'/);
    expect(res.headers['content-security-policy']).toMatch(/frame-ancestors 'none'/);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
  });
});

describe('bad input', () => {
  it('when the JSON body is malformed, then it answers 400 with a readable message', async () => {
    const res = await harness
      .agent()
      .post('/api/auth/sign-out')
      .set('Content-Type', 'application/json')
      .send('{"oops":')
      .expect(400);
    expect(res.body.error.message).toMatch(/not valid JSON/);
  });

  it('when an API path does not exist, then it answers 404 in JSON', async () => {
    const res = await request(harness.app).get('/api/nothing-here').expect(404);
    expect(res.body.error.kind).toBe('not-found');
  });
});
