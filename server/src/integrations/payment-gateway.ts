import Stripe from 'stripe';
import type { AppConfig } from '../config.ts';

/**
 * The official Stripe SDK. With STRIPE_API_URL set (development and tests) it talks to fakes/stripe on loopback;
 * in production it talks to Stripe itself.
 */
export function createStripeClient(config: AppConfig): Stripe {
  const api = config.stripe.apiUrl ? new URL(config.stripe.apiUrl) : undefined;
  return new Stripe(config.stripe.secretKey, {
    maxNetworkRetries: api ? 0 : 2,
    ...(api
      ? {
          host: api.hostname,
          port: Number(api.port || (api.protocol === 'https:' ? 443 : 80)),
          protocol: api.protocol.replace(':', '') as 'http' | 'https',
        }
      : {}),
  });
}
