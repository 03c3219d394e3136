import express from 'express';
import { DEFAULT_FAKE_HOST, isLoopbackHost, serveHttpOnLoopback } from '../loopback-server.ts';
import { createApiRouter } from './api-router.ts';
import { createFakeControlRouter } from './fake-control-routes.ts';
import { mintProviderId, type FakeStripeContext, type IdPrefix } from './fake-stripe-context.ts';
import { STRIPE_API_VERSION, type FakeStripeState, type StripeEvent } from './fake-stripe-state.ts';
import { createPaymentPageRouter } from './payment-page-routes.ts';
import { loadFakeStripeState, saveFakeStripeState } from './state-file.ts';
import { createWebhookDispatcher } from './webhook-dispatcher.ts';

export type { FakeStripeState } from './fake-stripe-state.ts';

export interface StripeFakeOptions {
  port: number;
  host?: string;
  apiKey: string;
  /** Where signed events are POSTed; must be on loopback. Without it events are only recorded. */
  webhookUrl?: string;
  webhookSecret: string;
  /** Milliseconds since the epoch; defaults to Date.now. Drives `created` fields, card expiry and signatures. */
  now?: () => number;
  /** Keeps the state in this JSON file across restarts (loaded at start, written after every change). */
  stateFile?: string;
  /** Mints object ids; random with the real prefixes unless a test needs to imitate a faulty provider. */
  mintId?: (prefix: IdPrefix) => string;
}

/**
 * A local stand-in for the subset of Stripe's REST API the shop uses (Checkout Sessions with manual capture or in
 * setup mode, Customers with saved cards, PaymentIntents including off-session charges, holds that lapse, Refunds),
 * its hosted payment page and its signed webhooks. Point the official SDK at it with
 * `new Stripe(apiKey, { host, port, protocol: 'http' })`.
 */
export async function startStripeFake(
  opts: StripeFakeOptions,
): Promise<{ url: string; close(): Promise<void>; state: FakeStripeState }> {
  if (opts.webhookUrl !== undefined && !isLoopbackHost(new URL(opts.webhookUrl).hostname)) {
    throw new Error(`The Stripe fake delivers webhooks on loopback only; refusing ${opts.webhookUrl}.`);
  }
  const baseNow = opts.now ?? Date.now;
  let clockOffsetMs = 0;
  const now = () => baseNow() + clockOffsetMs;
  const nowSeconds = () => Math.floor(now() / 1000);
  const nextId = opts.mintId ?? mintProviderId;
  const state = loadFakeStripeState(opts.stateFile);
  let saveQueued = false;
  /** Writes the state file once after the current burst of changes (a request, its events, their deliveries). */
  const queueSave = () => {
    if (!opts.stateFile || saveQueued) return;
    saveQueued = true;
    setImmediate(() => {
      saveQueued = false;
      saveFakeStripeState(opts.stateFile!, state);
    });
  };
  const webhooks = createWebhookDispatcher({
    webhookUrl: opts.webhookUrl,
    webhookSecret: opts.webhookSecret,
    // Signed on the unmoved clock: the receiver checks the signature's age against its own clock.
    nowSeconds: () => Math.floor(baseNow() / 1000),
    deliveries: state.deliveries,
  });
  let baseUrl = '';

  const ctx: FakeStripeContext = {
    state,
    nextId,
    nowMs: now,
    nowSeconds,
    advanceClock(seconds) {
      clockOffsetMs += seconds * 1000;
    },
    paymentPageUrl: (sessionId) => `${baseUrl}/pay/${sessionId}`,
    emit(type, object) {
      const event: StripeEvent = {
        id: nextId('evt'),
        object: 'event',
        api_version: STRIPE_API_VERSION,
        created: nowSeconds(),
        // A snapshot: later changes to the object must not rewrite what the event said.
        data: { object: structuredClone(object) },
        livemode: false,
        pending_webhooks: webhooks.hasWebhookUrl ? 1 : 0,
        request: { id: null, idempotency_key: null },
        type,
      };
      state.events.push(event);
      queueSave();
      void webhooks.deliver(event).then(queueSave);
    },
  };

  const app = express();
  app.disable('x-powered-by');
  // The SDK sends `expand[0]=payment_intent` in GET query strings; the extended parser turns that into an array.
  app.set('query parser', 'extended');
  app.use((req, res, next) => {
    if (req.method !== 'GET') res.on('finish', queueSave);
    next();
  });
  app.use('/v1', createApiRouter(ctx, opts.apiKey));
  app.use('/pay', createPaymentPageRouter(ctx));
  app.use('/_fake', createFakeControlRouter(ctx, webhooks.deliver));

  const server = await serveHttpOnLoopback(app, opts.port, opts.host ?? DEFAULT_FAKE_HOST);
  baseUrl = server.url;
  return {
    url: server.url,
    state,
    async close() {
      await webhooks.close();
      await server.close();
      if (opts.stateFile) saveFakeStripeState(opts.stateFile, state);
    },
  };
}
