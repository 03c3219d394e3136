import { setTimeout as sleep } from 'node:timers/promises';
import type { StripeEvent, WebhookDelivery } from './fake-stripe-state.ts';
import { signWebhookPayload } from './webhook-signature.ts';

// Short on purpose: tests wait for retries. Four attempts in all, spread over about 1.3 s.
const RETRY_DELAYS_MS = [100, 300, 900];
const ATTEMPT_TIMEOUT_MS = 5_000;

/**
 * Sends events to the webhook endpoint, signed afresh for each attempt, retrying failures a few times. Deliveries
 * go one at a time in the order the events happened, so tests see the same sequence on every run (Stripe itself
 * promises no order, so the app must not rely on it).
 */
export function createWebhookDispatcher(opts: {
  webhookUrl?: string;
  webhookSecret: string;
  nowSeconds(): number;
  deliveries: WebhookDelivery[];
}) {
  const shutdown = new AbortController();
  let queue: Promise<void> = Promise.resolve();

  async function attempt(url: string, delivery: WebhookDelivery, payload: string): Promise<boolean> {
    delivery.attempts += 1;
    try {
      const response = await fetch(url, {
        method: 'POST',
        headers: {
          'Content-Type': 'application/json; charset=utf-8',
          'Stripe-Signature': signWebhookPayload(payload, opts.webhookSecret, opts.nowSeconds()),
        },
        body: payload,
        // A redirect counts as a failed delivery, as it does for Stripe.
        redirect: 'manual',
        signal: AbortSignal.any([shutdown.signal, AbortSignal.timeout(ATTEMPT_TIMEOUT_MS)]),
      });
      await response.arrayBuffer();
      delivery.statusCode = response.status;
      delivery.lastError = response.ok ? null : `HTTP ${response.status}`;
      return response.ok;
    } catch (error) {
      delivery.statusCode = null;
      delivery.lastError = error instanceof Error ? error.message : String(error);
      return false;
    }
  }

  async function deliverWithRetries(url: string, delivery: WebhookDelivery, event: StripeEvent): Promise<void> {
    // Stripe sends pretty-printed JSON; the signature covers these exact bytes.
    const payload = JSON.stringify(event, null, 2);
    for (const delayMs of [0, ...RETRY_DELAYS_MS]) {
      if (delayMs > 0) await sleep(delayMs, undefined, { signal: shutdown.signal }).catch(() => undefined);
      if (shutdown.signal.aborted) break;
      if (await attempt(url, delivery, payload)) {
        delivery.status = 'delivered';
        return;
      }
    }
    delivery.status = 'failed';
  }

  return {
    hasWebhookUrl: opts.webhookUrl !== undefined,

    /** Queues a delivery; resolves once it is delivered or has failed for good. Without a webhook URL, resolves undefined. */
    deliver(event: StripeEvent): Promise<WebhookDelivery | undefined> {
      const url = opts.webhookUrl;
      if (url === undefined) return Promise.resolve(undefined);
      const delivery: WebhookDelivery = {
        eventId: event.id,
        type: event.type,
        status: 'pending',
        statusCode: null,
        attempts: 0,
        lastError: null,
      };
      opts.deliveries.push(delivery);
      const done = queue.then(() => deliverWithRetries(url, delivery, event));
      queue = done;
      return done.then(() => delivery);
    },

    /** Abandons pending retries and waits for the attempt in flight to end. */
    async close(): Promise<void> {
      shutdown.abort();
      await queue;
    },
  };
}
