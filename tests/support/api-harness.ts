/**
 * The API under test: createApp over the real test database (migrated and freshly seeded per test file) with the
 * local sign-in stand-in on a free port. Tests talk to it through supertest.
 */
import request from 'supertest';
import { afterAll, beforeAll } from 'vitest';
import type { Express } from 'express';
import type Stripe from 'stripe';
import { loadConfig, type AppConfig } from '../../server/src/config.ts';
import { openDatabase, type Db } from '../../server/src/db/knex.ts';
import { createApp } from '../../server/src/app.ts';
import { createSessionLayer, type SessionLayer } from '../../server/src/auth/session.ts';
import { createStripeClient } from '../../server/src/integrations/payment-gateway.ts';
import { createMailer } from '../../server/src/integrations/mailer.ts';
import { createHeavyWork } from '../../server/src/integrations/heavy-work.ts';
import { startGoogleOAuthFake } from '../../fakes/google-oauth/server.ts';
import { demoPeople } from '../../seeds/data/people.ts';
import { localStack } from '../../scripts/stack.ts';

export interface ApiHarness {
  app: Express;
  config: AppConfig;
  db: Db;
  /** The Stripe client the app uses, so a test can spy on its calls. */
  stripe: Stripe;
  /** A supertest agent that keeps cookies and sends this app's Origin, as the browser apps do. */
  agent(): ReturnType<typeof request.agent>;
  /**
   * Signs the agent in through the authorization-code flow of the local provider, starting with `returnTo` when
   * given; resolves with where the callback sends the browser.
   */
  signIn(agent: ReturnType<typeof request.agent>, email: string, returnTo?: string): Promise<string>;
  close(): Promise<void>;
}

export type ApiAgent = ReturnType<ApiHarness['agent']>;

export const fixedNow = () => new Date('2026-12-01T10:00:00Z');

/** What a test file may change about its harness. */
interface HarnessOptions {
  /** Overrides of the test stack's settings, e.g. STRIPE_API_URL and SMTP_URL of fakes a test file starts itself. */
  env?: NodeJS.ProcessEnv;
  /** The app's clock; `fixedNow` unless a test needs another moment (the shop's evening, say). */
  now?: () => Date;
}

export async function startApiHarness(options: HarnessOptions = {}): Promise<ApiHarness> {
  const google = await startGoogleOAuthFake({
    port: 0,
    identities: demoPeople.map(({ sub, email, name, givenName, familyName }) => ({
      sub,
      email,
      name,
      givenName,
      familyName,
    })),
  });
  const stack = localStack('test');
  const config = loadConfig({
    ...process.env,
    ...stack.env,
    GOOGLE_OAUTH_BASE_URL: google.url,
    STATIC_DIR: '/nonexistent',
    // Tests change the catalogue straight in the database and expect the next request to see it; the re-check
    // window of a real server (500 ms) is tested on its own in catalogue-snapshot.test.ts.
    CATALOGUE_RECHECK_MS: '0',
    ...options.env,
  });
  const db = openDatabase(config.database);
  await db.migrate.latest();
  await db.seed.run();
  const sessions: SessionLayer = await createSessionLayer(config);
  const mailer = createMailer(config);
  const stripe = createStripeClient(config);
  const heavyWork = createHeavyWork(config.heavyWork);
  // The pool's threads load jsdom, jimp, resvg and pdfkit once; that happens here, in the hook, not in a test.
  await heavyWork.ready;
  const app = createApp({
    config,
    db,
    sessions,
    stripe,
    mailer,
    heavyWork,
    now: options.now ?? fixedNow,
    log: () => {},
  });

  const agent = () => request.agent(app).set('Origin', config.appOrigin);

  async function signIn(client: ReturnType<typeof request.agent>, email: string, returnTo?: string): Promise<string> {
    const start = await client
      .get('/api/auth/google')
      .query(returnTo ? { returnTo } : {})
      .expect(302);
    const authorizeUrl = new URL(start.headers.location!);
    const person = demoPeople.find((p) => p.email === email);
    // The stand-in's page posts the chosen identity back to itself and redirects with a code.
    const form = new URLSearchParams({
      ...Object.fromEntries(authorizeUrl.searchParams),
      ...(person ? { identity: person.sub } : { email }),
    });
    const decision = await fetch(new URL('/authorize', google.url), { method: 'POST', body: form, redirect: 'manual' });
    const callback = new URL(decision.headers.get('location')!);
    return (await client.get(`${callback.pathname}${callback.search}`).expect(302)).headers.location!;
  }

  return {
    app,
    config,
    db,
    stripe,
    agent,
    signIn,
    async close() {
      await sessions.close();
      mailer.close();
      await heavyWork.close();
      await db.destroy();
      await google.close();
    },
  };
}

/**
 * The harness for one test file: started before its tests and closed after them by hooks this registers, so the
 * file only says what it needs. Its members may be used inside tests and hooks, once it has started.
 */
export function useApiHarness(options: HarnessOptions = {}): Omit<ApiHarness, 'close'> {
  let started: ApiHarness | undefined;
  beforeAll(async () => {
    started = await startApiHarness(options);
  });
  afterAll(async () => {
    await started?.close();
  });
  const current = () => {
    if (!started) throw new Error('The API harness starts in beforeAll: use it inside a test or a hook.');
    return started;
  };
  return {
    get app() {
      return current().app;
    },
    get config() {
      return current().config;
    },
    get db() {
      return current().db;
    },
    get stripe() {
      return current().stripe;
    },
    agent: () => current().agent(),
    signIn: (client, email, returnTo) => current().signIn(client, email, returnTo),
  };
}

/**
 * Another server instance over the same test database, with its own pool, sessions and in-memory catalogue, as a
 * second process would be. `wrapSessions` lets a test watch the session layer it is given.
 */
export async function startAnotherApp(
  config: AppConfig,
  options: { wrapSessions?: (layer: SessionLayer) => SessionLayer } = {},
): Promise<{ app: Express; close(): Promise<void> }> {
  const db = openDatabase(config.database);
  const sessions = await createSessionLayer(config);
  const mailer = createMailer(config);
  const heavyWork = createHeavyWork({ ...config.heavyWork, threads: 1 });
  const app = createApp({
    config,
    db,
    sessions: options.wrapSessions?.(sessions) ?? sessions,
    stripe: createStripeClient(config),
    mailer,
    heavyWork,
    now: fixedNow,
    log: () => {},
  });
  return {
    app,
    async close() {
      await sessions.close();
      mailer.close();
      await heavyWork.close();
      await db.destroy();
    },
  };
}
