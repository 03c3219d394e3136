/**
 * A visitor who has no session cookie yet browses the catalogue and prices designs without a session: no row is
 * read from or written to the session store for those requests. A request that does keep something (a stored
 * quote) still gets its session.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type { Express } from 'express';
import type { SessionLayer } from '../../server/src/auth/session.ts';
import { daisyDressQuote } from '../support/sample-designs.ts';
import { startAnotherApp, useApiHarness } from '../support/api-harness.ts';

const harness = useApiHarness();

/** An app whose session layer counts the requests that reach it, over the test database. */
let counted: { app: Express; close(): Promise<void> };
const reached: string[] = [];
beforeAll(async () => {
  counted = await startAnotherApp(harness.config, {
    wrapSessions: (sessions): SessionLayer => ({
      middleware: (req, res, next) => {
        reached.push(`${req.method} ${req.originalUrl}`);
        sessions.middleware(req, res, next);
      },
      close: () => sessions.close(),
    }),
  });
});
afterAll(async () => {
  await counted?.close();
});

const sessionRows = async () => Number((await harness.db('sessions').count({ n: '*' }))[0].n);
const visitor = () => request(counted.app);
const origin = () => harness.config.appOrigin;

describe('sessions for visitors without a cookie', () => {
  it('when a visitor without a cookie browses the catalogue and previews a quote, then the session store is not touched and no cookie is set', async () => {
    const rowsBefore = await sessionRows();
    reached.length = 0;
    const garments = await visitor().get('/api/catalogue/garments').expect(200);
    const page = await visitor().get(`/api/catalogue/garments/${garments.body.garments[0].slug}`).expect(200);
    const preview = await visitor()
      .post('/api/quotes/preview')
      .set('Origin', origin())
      .send(daisyDressQuote)
      .expect(200);
    for (const res of [garments, page, preview]) expect(res.headers['set-cookie']).toBeUndefined();
    expect(reached).toEqual([]);
    expect(await sessionRows()).toBe(rowsBefore);
  });

  it('when a visitor stores a quote, then a session keeps it, and later previews with that cookie use the session', async () => {
    const agent = request.agent(counted.app);
    await agent.post('/api/quotes').set('Origin', origin()).send(daisyDressQuote).expect(201);
    expect(reached.at(-1)).toBe('POST /api/quotes');
    await agent.post('/api/quotes/preview').set('Origin', origin()).send(daisyDressQuote).expect(200);
    expect(reached.at(-1)).toBe('POST /api/quotes/preview');
  });
});
