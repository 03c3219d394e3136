/**
 * Runs the three fakes by hand: `npx tsx fakes/main.ts [--google-port 4010] [--stripe-port 12111] [--smtp-port 2525]
 * [--smtp-http-port 4025] [--webhook-url URL]`. Flags win over FAKE_GOOGLE_PORT, FAKE_STRIPE_PORT, FAKE_SMTP_PORT,
 * FAKE_SMTP_HTTP_PORT and STRIPE_WEBHOOK_URL; STRIPE_SECRET_KEY and STRIPE_WEBHOOK_SECRET default to the values
 * `npm start` gives the server. The sign-in page lists the seeded demo people.
 */
import { parseArgs } from 'node:util';
import { z } from 'zod';
import { demoPeople } from '../seeds/data/people.ts';
import type { FakeIdentity } from './google-oauth/server.ts';
import { startFakes } from './index.ts';

const { values: flags } = parseArgs({
  options: {
    'google-port': { type: 'string' },
    'stripe-port': { type: 'string' },
    'smtp-port': { type: 'string' },
    'smtp-http-port': { type: 'string' },
    'webhook-url': { type: 'string' },
  },
});

const port = z.coerce.number().int().min(0).max(65_535);
const settings = z
  .object({
    googlePort: port.default(4010),
    stripePort: port.default(12111),
    smtpPort: port.default(2525),
    smtpHttpPort: port.default(4025),
    stripeWebhookUrl: z.url().default('http://127.0.0.1:3000/api/webhooks/stripe'),
    stripeApiKey: z.string().min(1).default('sk_test_hoopwright_local'),
    stripeWebhookSecret: z.string().min(1).default('whsec_hoopwright_local'),
  })
  .parse({
    googlePort: flags['google-port'] ?? process.env.FAKE_GOOGLE_PORT,
    stripePort: flags['stripe-port'] ?? process.env.FAKE_STRIPE_PORT,
    smtpPort: flags['smtp-port'] ?? process.env.FAKE_SMTP_PORT,
    smtpHttpPort: flags['smtp-http-port'] ?? process.env.FAKE_SMTP_HTTP_PORT,
    stripeWebhookUrl: flags['webhook-url'] ?? process.env.STRIPE_WEBHOOK_URL,
    stripeApiKey: process.env.STRIPE_SECRET_KEY,
    stripeWebhookSecret: process.env.STRIPE_WEBHOOK_SECRET,
  });

const fakes = await startFakes({
  ...settings,
  identities: demoPeople.map(({ sub, email, name, givenName, familyName }: FakeIdentity) => ({
    sub,
    email,
    name,
    givenName,
    familyName,
  })),
});
console.log(`Sign-in stand-in   ${fakes.urls.google}/authorize`);
console.log(`Payments API       ${fakes.urls.stripe}/v1  (webhooks to ${settings.stripeWebhookUrl})`);
console.log(`Mail (SMTP)        ${fakes.urls.smtp}`);
console.log(`Captured mail      ${fakes.urls.smtpHttp}/messages`);
console.log('Press Ctrl-C to stop.');

for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.once(signal, () => {
    fakes.close().then(
      () => process.exit(0),
      (error: unknown) => {
        console.error(error);
        process.exit(1);
      },
    );
  });
}
