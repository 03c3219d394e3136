import { startGoogleOAuthFake, type FakeIdentity } from './google-oauth/server.ts';
import { startSmtpFake } from './smtp/server.ts';
import { startStripeFake } from './stripe/server.ts';

export interface FakesConfig {
  host?: string;
  googlePort: number;
  stripePort: number;
  smtpPort: number;
  smtpHttpPort: number;
  identities: FakeIdentity[];
  stripeApiKey: string;
  stripeWebhookSecret: string;
  stripeWebhookUrl: string;
  /** Where the payment stand-in keeps its state between runs; in memory only when left out. */
  stripeStateFile?: string;
}

export interface FakeUrls {
  /** OAuth provider base: `/authorize`, `/token`, `/userinfo`. */
  google: string;
  /** Stripe API base (`/v1/...`), hosted pages at `/pay/:id`, test endpoints at `/_fake/...`. */
  stripe: string;
  /** `smtp://host:port` for nodemailer. */
  smtp: string;
  /** Captured mail over HTTP: `/messages`. */
  smtpHttp: string;
}

/** Starts the three local stand-ins together; if one cannot start, the others are stopped again. */
export async function startFakes(cfg: FakesConfig): Promise<{ urls: FakeUrls; close(): Promise<void> }> {
  const [google, stripe, smtp] = await Promise.allSettled([
    startGoogleOAuthFake({ port: cfg.googlePort, host: cfg.host, identities: cfg.identities }),
    startStripeFake({
      port: cfg.stripePort,
      host: cfg.host,
      apiKey: cfg.stripeApiKey,
      webhookSecret: cfg.stripeWebhookSecret,
      webhookUrl: cfg.stripeWebhookUrl,
      stateFile: cfg.stripeStateFile,
    }),
    startSmtpFake({ smtpPort: cfg.smtpPort, httpPort: cfg.smtpHttpPort, host: cfg.host }),
  ]);
  const started = [google, stripe, smtp].flatMap((result) => (result.status === 'fulfilled' ? [result.value] : []));
  const closeAll = async () => {
    await Promise.all(started.map((fake) => fake.close()));
  };
  if (google.status === 'rejected' || stripe.status === 'rejected' || smtp.status === 'rejected') {
    await closeAll();
    const reasons = [google, stripe, smtp].flatMap((result) => (result.status === 'rejected' ? [result.reason] : []));
    throw new AggregateError(
      reasons,
      `Could not start the local fakes: ${reasons.map((reason) => String(reason)).join('; ')}`,
    );
  }
  return {
    urls: {
      google: google.value.url,
      stripe: stripe.value.url,
      smtp: smtp.value.smtpUrl,
      smtpHttp: smtp.value.httpUrl,
    },
    close: closeAll,
  };
}
