/**
 * The abuse limits, lowered for this file's app: each limited route answers 429 with Retry-After and a sentence once
 * a client has used its share, and the count is kept in the database, so a second server instance sees it too.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/src/app.ts';
import { createSessionLayer, type SessionLayer } from '../../server/src/auth/session.ts';
import { createStripeClient } from '../../server/src/integrations/payment-gateway.ts';
import { createHeavyWork } from '../../server/src/integrations/heavy-work.ts';
import { createMailer, type Mailer } from '../../server/src/integrations/mailer.ts';
import { fixedNow, useApiHarness, type ApiAgent } from '../support/api-harness.ts';
import { errorOf } from '../support/api-calls.ts';
import { daisyDressQuote } from '../support/sample-designs.ts';
import { RateLimiterRes } from 'rate-limiter-flexible';
import { OneTripRateLimiter } from '../../server/src/middleware/one-trip-rate-limiter.ts';

const harness = useApiHarness({
  env: {
    RATE_LIMIT_WINDOW_SECONDS: '600',
    RATE_LIMIT_SIGN_IN: '8',
    RATE_LIMIT_QUOTE_PREVIEWS: '3',
    RATE_LIMIT_UPLOADS: '3',
    RATE_LIMIT_ORDERS: '3',
    RATE_LIMIT_PROOF_ANSWERS: '3',
  },
});

let priya: ApiAgent;
let harriet: ApiAgent;
let owner: ApiAgent;
beforeAll(async () => {
  // Three sign-ins use 6 of the address's 8 sign-in requests (a start and a callback each).
  priya = harness.agent();
  harriet = harness.agent();
  owner = harness.agent();
  await harness.signIn(priya, 'priya@example.test');
  await harness.signIn(harriet, 'harriet@example.test');
  await harness.signIn(owner, 'marigold@wrenandbobbin.test');
});

/** The answer once over the limit: 429, a wait in seconds no longer than the window, and a sentence with it. */
function expectRefused(res: request.Response, what: RegExp) {
  expect(res.status).toBe(429);
  const wait = Number(res.headers['retry-after']);
  expect(wait).toBeGreaterThan(0);
  expect(wait).toBeLessThanOrEqual(600);
  const error = errorOf(res.body);
  expect(error.kind).toBe('too-many-requests');
  expect(error.message).toMatch(what);
  expect(error.message).toMatch(/try again in \d+ (seconds|minutes)/);
}

describe('rate limits', () => {
  it('when a visitor asks for more price checks than the limit, then the next is 429 with Retry-After', async () => {
    const visitor = harness.agent();
    for (let i = 0; i < 3; i += 1) await visitor.post('/api/quotes/preview').send(daisyDressQuote).expect(200);
    expectRefused(await visitor.post('/api/quotes/preview').send(daisyDressQuote), /more price checks/);
  });

  it('when sign-in is started again and again from one address, then it is refused after the limit', async () => {
    const visitor = harness.agent();
    await visitor.get('/api/auth/google').expect(302);
    await visitor.get('/api/auth/google').expect(302);
    expectRefused(await visitor.get('/api/auth/google'), /more sign-in attempts/);
    expectRefused(await visitor.get('/api/auth/google/callback?code=x&state=y'), /more sign-in attempts/);
    // A browser opening the sign-in page gets the same refusal as a page to read, with the way back.
    const page = await visitor.get('/api/auth/google').set('Accept', 'text/html,application/xhtml+xml,*/*;q=0.8');
    expect(page.status).toBe(429);
    expect(Number(page.headers['retry-after'])).toBeGreaterThan(0);
    expect(page.headers['content-type']).toMatch(/^text\/html/);
    expect(page.text).toMatch(/That is more sign-in attempts than we take in a short while\. Please try again in \d+/);
    expect(page.text).toContain('<a href="/sign-in">Back to signing in</a>');
  });

  it('when a visitor sends more uploads than the limit, then the next is refused before the file is read', async () => {
    const visitor = harness.agent();
    const svg = Buffer.from(
      '<svg xmlns="http://www.w3.org/2000/svg" width="10mm" height="10mm"><rect width="5" height="5"/></svg>',
    );
    const upload = () =>
      visitor.post('/api/artwork').attach('file', svg, { filename: 'a.svg', contentType: 'image/svg+xml' });
    for (let i = 0; i < 3; i += 1) expect((await upload()).status).not.toBe(429);
    expectRefused(await upload(), /more uploads/);

    // The studio's uploads (motif drawings, proof photos) share one count per member.
    const motif = () =>
      owner
        .post('/api/admin/catalogue/motifs/preview')
        .attach('file', svg, { filename: 'm.svg', contentType: 'image/svg+xml' });
    for (let i = 0; i < 3; i += 1) expect((await motif()).status).not.toBe(429);
    expectRefused(
      await owner
        .post('/api/admin/orders/WB-1009/proofs')
        .field('source', 'photo')
        .attach('file', svg, { filename: 'p.svg', contentType: 'image/svg+xml' }),
      /more uploads/,
    );
  });

  it('when a customer sends more checkouts than the limit, then the next is 429, counted for their account', async () => {
    for (let i = 0; i < 3; i += 1) await priya.post('/api/orders').send({}).expect(400);
    expectRefused(await priya.post('/api/orders').send({}), /more checkouts/);
    // Another customer at the same address has their own count.
    await harriet.post('/api/orders').send({}).expect(400);
  });

  it('when a customer answers proofs more often than the limit, then the next answer is 429', async () => {
    for (let i = 0; i < 3; i += 1) await harriet.post('/api/orders/WB-1008/proofs/1/approval').send({}).expect(409);
    expectRefused(
      await harriet.post('/api/orders/WB-1008/proofs/2/change-request').send({ comment: 'x' }),
      /more answers to proofs/,
    );
  });

  it('when a second server instance shares the database, then it sees the counts the first one kept', async () => {
    const sessions: SessionLayer = await createSessionLayer(harness.config);
    const mailer: Mailer = createMailer(harness.config);
    const heavyWork = createHeavyWork({ ...harness.config.heavyWork, threads: 1 });
    try {
      const second = createApp({
        heavyWork,
        config: harness.config,
        db: harness.db,
        sessions,
        stripe: createStripeClient(harness.config),
        mailer,
        now: fixedNow,
        log: () => {},
      });
      const first = harness.agent();
      await first.post('/api/quotes/preview').send({}).expect(429);
      const res = await request(second).post('/api/quotes/preview').set('Origin', harness.config.appOrigin).send({});
      expectRefused(res, /more price checks/);
    } finally {
      await sessions.close();
      mailer.close();
      await heavyWork.close();
    }
  });
});

describe('the one-statement counter', () => {
  const counter = (points: number, duration: number) =>
    new OneTripRateLimiter({
      storeClient: harness.db,
      storeType: 'knex',
      dbName: harness.config.database.database,
      tableName: 'rate_limits',
      tableCreated: true,
      clearExpiredByTimeout: false,
      keyPrefix: `counter-${points}-${duration}`,
      points,
      duration,
    });

  it('when 40 requests count at once against a limit of 25, then exactly 25 pass and 15 are refused', async () => {
    const limiter = counter(25, 600);
    const outcomes = await Promise.all(
      Array.from({ length: 40 }, () =>
        limiter.consume('one-address').then(
          () => 'passed',
          (refusal: unknown) => (refusal instanceof RateLimiterRes ? 'refused' : 'failed'),
        ),
      ),
    );
    expect(outcomes.filter((o) => o === 'passed')).toHaveLength(25);
    expect(outcomes.filter((o) => o === 'refused')).toHaveLength(15);
  });

  it('when a client is refused, then the wait is what is left of its window, and the next window counts from 1', async () => {
    const limiter = counter(2, 2);
    await limiter.consume('a');
    await limiter.consume('a');
    const refusal = await limiter.consume('a').catch((r: RateLimiterRes) => r);
    expect(refusal).toBeInstanceOf(RateLimiterRes);
    expect((refusal as RateLimiterRes).msBeforeNext).toBeGreaterThan(0);
    expect((refusal as RateLimiterRes).msBeforeNext).toBeLessThanOrEqual(2_000);
    await new Promise((resolve) => setTimeout(resolve, (refusal as RateLimiterRes).msBeforeNext + 50));
    const fresh = await limiter.consume('a');
    expect(fresh.consumedPoints).toBe(1);
    expect(fresh.remainingPoints).toBe(1);
  });
});
