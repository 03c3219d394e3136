import { createHmac } from 'node:crypto';

/**
 * The `Stripe-Signature` header for a webhook body: `t=<unix seconds>,v1=<hex HMAC-SHA256(secret, "t.body")>`, the
 * scheme `stripe.webhooks.constructEvent` verifies (docs.stripe.com/webhooks/signatures).
 */
export function signWebhookPayload(payload: string, secret: string, timestampSeconds: number): string {
  const signature = createHmac('sha256', secret).update(`${timestampSeconds}.${payload}`).digest('hex');
  return `t=${timestampSeconds},v1=${signature}`;
}
