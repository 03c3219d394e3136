/**
 * Two API server processes on one database behind a round-robin proxy, with a job worker in each: one whole order
 * crosses both (sign in, upload, quote, order, pay, the webhook, proof, approval, charge) and nothing is done twice;
 * a studio edit reaches both servers' in-memory catalogues, and the abuse limits count across both.
 */
import { once } from 'node:events';
import { createServer, request as forward, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { ChildProcess } from 'node:child_process';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadDatabaseConfig } from '../../server/src/config.ts';
import { openDatabase } from '../../server/src/db/knex.ts';
import { checkoutStartedResponse, customerOrderResponse } from '../../server/src/contracts/orders.ts';
import { artworkListResponse, artworkUploadResponse } from '../../server/src/contracts/artwork.ts';
import { localStack, startLocalFakes, startServerProcess, stopProcess } from '../../scripts/stack.ts';
import { signInOverHttp } from '../support/api-calls.ts';
import { daisyDressQuote } from '../support/sample-designs.ts';
import { quotePreviewResponse } from '../../server/src/contracts/quotes.ts';
import type { ShopSettings } from '../../server/src/contracts/admin-settings.ts';
import { payWithTestCard, priyaShipTo, quoteSavedDesign } from '../support/priya-orders.ts';

const testStack = localStack('test');
const db = openDatabase(loadDatabaseConfig({ ...process.env, ...testStack.env }));
const servers: ChildProcess[] = [];
let fakes: Awaited<ReturnType<typeof startLocalFakes>>;
let proxy: Server;
let proxyOrigin: string;
const hits = new Map<string, number>();

async function freePort(): Promise<number> {
  const probe = createServer().listen(0, '127.0.0.1');
  await once(probe, 'listening');
  const { port } = probe.address() as AddressInfo;
  probe.close();
  return port;
}

/** A plain round-robin reverse proxy: each request goes to the next backend, headers and body passed through. */
function startProxy(backends: string[]): Promise<Server> {
  let next = 0;
  const server = createServer((incoming, outgoing) => {
    const backend = new URL(backends[next++ % backends.length]!);
    hits.set(backend.port, (hits.get(backend.port) ?? 0) + 1);
    const upstream = forward(
      {
        host: backend.hostname,
        port: backend.port,
        method: incoming.method,
        path: incoming.url,
        headers: incoming.headers,
      },
      (answer) => {
        outgoing.writeHead(answer.statusCode ?? 502, answer.headers);
        answer.pipe(outgoing);
      },
    );
    upstream.on('error', () => {
      outgoing.writeHead(502).end();
    });
    incoming.pipe(upstream);
  });
  return new Promise((resolve) => server.listen(0, '127.0.0.1', () => resolve(server)));
}

beforeAll(async () => {
  await db.migrate.latest();
  await db.seed.run();
  const ports = [await freePort(), await freePort()];
  proxy = await startProxy(ports.map((port) => `http://127.0.0.1:${port}`));
  proxyOrigin = `http://127.0.0.1:${(proxy.address() as AddressInfo).port}`;
  fakes = await startLocalFakes({
    ...testStack,
    appOrigin: proxyOrigin,
    ports: { ...testStack.ports, google: 0, stripe: 0, smtp: 0, smtpHttp: 0 },
  });
  for (const port of ports) {
    const env = {
      ...testStack.env,
      PORT: String(port),
      APP_ORIGIN: proxyOrigin,
      GOOGLE_OAUTH_BASE_URL: fakes.urls.google,
      STRIPE_API_URL: fakes.urls.stripe,
      SMTP_URL: fakes.urls.smtp,
      WORKER_IN_PROCESS: 'true',
      // Low enough for the test below to reach through both servers; the counts live in the shared database.
      RATE_LIMIT_QUOTE_PREVIEWS: '6',
    };
    servers.push(
      await startServerProcess({ ...testStack, env, appOrigin: `http://127.0.0.1:${port}` }, { quiet: true }),
    );
  }
}, 120_000);

afterAll(async () => {
  await Promise.all(servers.map((server) => stopProcess(server)));
  await fakes?.close();
  proxy?.close();
  await db.destroy();
});

const agentFor = () => request.agent(proxyOrigin).set('Origin', proxyOrigin);
const drawing =
  '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 40 40"><circle cx="20" cy="20" r="15" fill="#e58fb0"/></svg>';

describe('two servers behind a proxy', () => {
  it('when one order crosses both servers, then every step lands and nothing is done twice', async () => {
    const priya = agentFor();
    await signInOverHttp(priya, fakes.urls.google, 'priya@example.test');
    // Signed in on one server, the next requests are answered by the other one from the shared session store.
    for (let i = 0; i < 2; i += 1)
      expect((await priya.get('/api/me').expect(200)).body.user.email).toBe('priya@example.test');

    const uploaded = await priya
      .post('/api/artwork')
      .attach('file', Buffer.from(drawing), { filename: 'flower.svg', contentType: 'image/svg+xml' })
      .expect(201);
    const { artwork } = artworkUploadResponse.parse(uploaded.body);
    const { artworks } = artworkListResponse.parse((await priya.get('/api/artwork').expect(200)).body);
    expect(artworks.map((listed) => listed.id)).toContain(artwork.id);

    const quote = await quoteSavedDesign(priya);
    const placed = await priya
      .post('/api/orders')
      .send({ quoteId: quote.quoteId, designId: 1, neededBy: quote.readyDates.earliestReadyDate, shipTo: priyaShipTo })
      .expect(201);
    const { number, checkoutUrl } = checkoutStartedResponse.parse(placed.body);
    expect(await payWithTestCard(checkoutUrl!)).toBe(303);
    // The payment stand-in posts its signed webhook to the proxy, so either server may take it.
    await expect
      .poll(
        async () =>
          customerOrderResponse.parse((await priya.get(`/api/orders/${number}`).expect(200)).body).order.status,
        {
          timeout: 15_000,
        },
      )
      .toBe('authorized');

    const staff = agentFor();
    await signInOverHttp(staff, fakes.urls.google, 'tobias@wrenandbobbin.test');
    await staff
      .post(`/api/admin/orders/${number}/proofs`)
      .send({ source: 'render', message: 'Drawn to scale.' })
      .expect(201);
    await priya.post(`/api/orders/${number}/proofs/1/approval`).send({}).expect(200);
    await staff.post(`/api/admin/orders/${number}/capture`).send({}).expect(200);

    const order = await db('orders').where({ number }).first('id', 'status', 'total_cents');
    expect(order.status).toBe('in_production');
    const payments = await db('payments').where({ order_id: order.id, status: 'captured' });
    expect(payments).toHaveLength(1);
    expect(payments[0].amount_captured_cents).toBe(order.total_cents);
    const events = await db('order_events').where({ order_id: order.id }).pluck('type');
    expect(events.filter((type) => type === 'payment_authorized')).toHaveLength(1);
    // Each e-mail of this order was written once and sent once, though two workers watch the queue.
    await expect
      .poll(async () => db('email_log').where({ order_id: order.id }).whereNot({ status: 'sent' }).count({ n: '*' }))
      .toEqual([{ n: 0 }]);
    const logged = (await db('email_log').where({ order_id: order.id }).select('template', 'to_email', 'subject')) as {
      template: string;
      to_email: string;
      subject: string;
    }[];
    expect(logged.length).toBeGreaterThan(2);
    expect(new Set(logged.map((mail) => mail.template)).size).toBe(logged.length);
    const captured = (await (await fetch(`${fakes.urls.smtpHttp}/messages`)).json()) as {
      subject: string;
      to: string;
    }[];
    for (const mail of logged) {
      const copies = captured.filter((sent) => sent.subject === mail.subject && sent.to.includes(mail.to_email));
      expect(copies, mail.template).toHaveLength(1);
    }
    expect([...hits.values()].every((count) => count > 5)).toBe(true);
  }, 120_000);

  it('when the owner edits the shop through one server, then the next price check on either uses it, and the price-check limit counts across both', async () => {
    const owner = agentFor();
    await signInOverHttp(owner, fakes.urls.google, 'marigold@wrenandbobbin.test');
    const visitor = () =>
      request(proxyOrigin).post('/api/quotes/preview').set('Origin', proxyOrigin).send(daisyDressQuote);
    const runMinutes = async () =>
      quotePreviewResponse.parse((await visitor().expect(200)).body).runMinutes.totalMinutes;

    // One price check through each server, so both hold the catalogue in memory before the edit.
    const before = await runMinutes();
    expect(await runMinutes()).toBe(before);
    const { settings } = (await owner.get('/api/admin/settings').expect(200)).body as { settings: ShopSettings };
    await owner
      .put('/api/admin/settings')
      .send({ ...settings, setupMinutes: settings.setupMinutes + 30 })
      .expect(200);
    // The server that took the edit sees it at once; the other within its re-check window (CATALOGUE_RECHECK_MS,
    // 500 ms by default), which has passed once the wait is over.
    await new Promise((resolve) => setTimeout(resolve, 600));
    for (let i = 0; i < 4; i += 1) expect(await runMinutes()).toBeCloseTo(before + 30, 6);

    // Six price checks so far from this address, three on each server: the seventh is refused, whichever answers.
    const refused = await visitor().expect(429);
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
    expect(refused.body.error.message).toMatch(/price checks/);
    await visitor().expect(429);
    await owner.put('/api/admin/settings').send(settings).expect(200);
  }, 60_000);
});
