import { describe, expect, it } from 'vitest';
import { startFakes } from '../../../fakes/index.ts';

const identities = [
  {
    sub: '100000000000000000301',
    email: 'ida@wren-bobbin.test',
    name: 'Ida Marchetti',
    givenName: 'Ida',
    familyName: 'Marchetti',
  },
];
const config = {
  googlePort: 0,
  stripePort: 0,
  smtpPort: 0,
  smtpHttpPort: 0,
  identities,
  stripeApiKey: 'sk_test_start_fakes',
  stripeWebhookSecret: 'whsec_start_fakes',
  stripeWebhookUrl: 'http://127.0.0.1:9/webhooks',
};

describe('startFakes', () => {
  it('when started on port 0, then all three answer on loopback at the reported URLs and stop on close', async () => {
    const fakes = await startFakes(config);
    const { google, stripe, smtp, smtpHttp } = fakes.urls;
    for (const url of [google, stripe, smtp, smtpHttp]) expect(url).toMatch(/^(http|smtp):\/\/127\.0\.0\.1:\d+$/);
    expect((await fetch(`${google}/userinfo`)).status).toBe(401);
    expect((await fetch(`${stripe}/v1/payment_intents/pi_x`)).status).toBe(401);
    expect(await (await fetch(`${smtpHttp}/messages`)).json()).toEqual([]);
    await fakes.close();
    await expect(fetch(`${stripe}/_fake/state`)).rejects.toThrow();
  });

  it('when one fake cannot bind its port, then the start fails and the others are stopped', async () => {
    const first = await startFakes(config);
    const taken = Number(new URL(first.urls.stripe).port);
    await expect(startFakes({ ...config, stripePort: taken })).rejects.toThrow(
      /Could not start the local fakes: .*EADDRINUSE/,
    );
    await first.close();
  });

  it('when asked to listen beyond loopback, then it refuses', async () => {
    await expect(startFakes({ ...config, host: '0.0.0.0' })).rejects.toThrow(/loopback only/);
  });
});
