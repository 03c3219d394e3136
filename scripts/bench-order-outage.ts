/**
 * Order placement while the database goes away: `npm run bench:order-outage`. Each round prepares fresh stored
 * quotes, then four clients place orders from them (one checkout per quote, each client pausing 100 ms between
 * checkouts) for 12 s, while the project's MariaDB is killed (SIGKILL) 3 s in and started again 5 s later. A client
 * sends a checkout again, with the same body, until it is answered 201 or refused with a 4xx, as a browser that
 * retries would. After the round it counts, from the database, the orders the clients were not told about, the
 * orders they were told about that are missing, and the quotes with more than one order; all three should be 0.
 * It runs three rounds on a scratch database (`hoopwright_bench_outage`, dropped at the end).
 */
import { setTimeout as sleep } from 'node:timers/promises';
import { startStripeFake } from '../fakes/stripe/server.ts';
import { checkoutStartedResponse } from '../server/src/contracts/orders.ts';
import { startApiHarness, type ApiAgent } from '../tests/support/api-harness.ts';
import { priyasCheckout } from '../tests/support/checkout-bodies.ts';
import {
  dropLocalDatabase,
  killLocalDatabase,
  localDatabaseSettings,
  startLocalDatabase,
  stopLocalDatabase,
} from './db-lifecycle.ts';

const DATABASE = 'hoopwright_bench_outage';
const ROUNDS = 3;
const CLIENTS = 4;
const QUOTES_PER_ROUND = 240;
const LOAD_MS = 12_000;
const OUTAGE_AFTER_MS = 3_000;
const OUTAGE_MS = 5_000;
const PAUSE_MS = 100;
const RETRY_MS = 200;
const STRIPE_KEY = 'sk_test_bench_outage';

const settings = { ...localDatabaseSettings(), databases: [DATABASE] };
const { started } = await startLocalDatabase(settings);
const stripe = await startStripeFake({ port: 0, apiKey: STRIPE_KEY, webhookSecret: 'whsec_bench_outage' });
const harness = await startApiHarness({
  env: {
    DB_NAME: DATABASE,
    STRIPE_API_URL: stripe.url,
    STRIPE_SECRET_KEY: STRIPE_KEY,
    // The load comes from one customer at one address; the limits are not what this measures.
    RATE_LIMIT_ORDERS: '1000000',
  },
});

interface Tally {
  told: Set<string>;
  answers201: number;
  refused4xx: number;
  failedAttempts: number;
}

/** One checkout, sent again after every 5xx or network failure until it is answered. */
async function placeUntilAnswered(agent: ApiAgent, body: object, tally: Tally, deadline: number): Promise<void> {
  while (Date.now() < deadline) {
    const res = await agent
      .post('/api/orders')
      .send(body)
      .then(
        (answer) => answer,
        () => undefined,
      );
    if (res && res.status === 201) {
      tally.answers201 += 1;
      tally.told.add(checkoutStartedResponse.parse(res.body).number);
      return;
    }
    if (res && res.status >= 400 && res.status < 500) {
      tally.refused4xx += 1;
      return;
    }
    tally.failedAttempts += 1;
    await sleep(RETRY_MS);
  }
}

async function round(index: number): Promise<string> {
  const agent = harness.agent();
  await harness.signIn(agent, 'priya@example.test');
  const bodies: object[] = [];
  for (let i = 0; i < QUOTES_PER_ROUND; i += 1) bodies.push((await priyasCheckout(agent)).body);
  const quoteIds = bodies.map((body) => (body as { quoteId: number }).quoteId);

  const tally: Tally = { told: new Set(), answers201: 0, refused4xx: 0, failedAttempts: 0 };
  const startedAt = Date.now();
  const loadEnds = startedAt + LOAD_MS;
  let next = 0;
  const client = async () => {
    while (Date.now() < loadEnds && next < bodies.length) {
      const body = bodies[next++]!;
      // Every checkout begun is seen through, even after the load's time is up.
      await placeUntilAnswered(agent, body, tally, loadEnds + 60_000);
      await sleep(PAUSE_MS);
    }
  };
  const outage = (async () => {
    await sleep(OUTAGE_AFTER_MS);
    await killLocalDatabase(settings);
    const killedAt = Date.now();
    await sleep(OUTAGE_MS);
    await startLocalDatabase(settings);
    return { killedAt: killedAt - startedAt, backAfterMs: Date.now() - killedAt };
  })();
  await Promise.all(Array.from({ length: CLIENTS }, client));
  const down = await outage;

  const rows: { number: string; quote_id: number }[] = await harness
    .db('orders')
    .whereIn('quote_id', quoteIds)
    .select('number', 'quote_id');
  const inDatabase = new Set(rows.map((row) => row.number));
  const notTold = rows.filter((row) => !tally.told.has(row.number)).length;
  const lost = [...tally.told].filter((number) => !inDatabase.has(number)).length;
  const perQuote = new Map<number, number>();
  for (const row of rows) perQuote.set(row.quote_id, (perQuote.get(row.quote_id) ?? 0) + 1);
  const duplicated = [...perQuote.values()].filter((n) => n > 1).length;
  return (
    `round ${index}: ${next} checkouts begun by ${CLIENTS} clients, ${tally.answers201} answered 201, ` +
    `${tally.refused4xx} refused 4xx, ${tally.failedAttempts} attempts failed and were sent again; ` +
    `database killed at ${(down.killedAt / 1000).toFixed(1)} s, answering again ${(down.backAfterMs / 1000).toFixed(1)} s later; ` +
    `${rows.length} orders in the database — not told about ${notTold}, lost ${lost}, duplicated ${duplicated}`
  );
}

try {
  console.log(
    `Order placement with the database killed for ${OUTAGE_MS / 1000} s: ${CLIENTS} clients, up to ${QUOTES_PER_ROUND} ` +
      `checkouts each round (one per stored quote, ${PAUSE_MS} ms apart per client) for ${LOAD_MS / 1000} s; ` +
      `failed checkouts are sent again every ${RETRY_MS} ms. Targets: not told 0, lost 0, duplicated 0.`,
  );
  for (let i = 1; i <= ROUNDS; i += 1) console.log(await round(i));
} finally {
  await harness.close();
  await stripe.close();
  dropLocalDatabase(DATABASE, settings);
  if (started) await stopLocalDatabase(settings);
}
