/**
 * Order-board benchmark: fills a scratch database (`hoopwright_bench`, created here on the project's MariaDB and
 * dropped again at the end) with the demo shop plus 50,000 generated orders from 2,000 generated customers, then
 * times the board's typical queries through the same repo functions the API calls. Prints the median and p95 of
 * each. Run with `npm run bench:orders` (it starts the project's MariaDB if it is not running).
 */
import { loadDatabaseConfig } from '../server/src/config.ts';
import { openDatabase, type Db } from '../server/src/db/knex.ts';
import { orderBoardQuery, type OrderBoardQuery } from '../server/src/contracts/studio-orders.ts';
import { listBoardOrders, listDueCandidates } from '../server/src/modules/orders/order-board-repo.ts';
import {
  dropLocalDatabase,
  localDatabaseSettings,
  recreateLocalDatabase,
  startLocalDatabase,
  stopLocalDatabase,
} from './db-lifecycle.ts';
import { localStack } from './stack.ts';

const DATABASE = 'hoopwright_bench';
const ORDER_COUNT = 50_000;
const CUSTOMER_COUNT = 2_000;
const CHUNK = 1_000;
const WARM_UP = 3;
const SAMPLES = 40;
/** The board's "today" in the generated data. */
const TODAY = '2026-12-01';
const DAY_MS = 86_400_000;

/** A small seeded generator (mulberry32), so every run builds the same shop. */
function random(seed: number): () => number {
  let state = seed;
  return () => {
    state = (state + 0x6d2b79f5) | 0;
    let t = Math.imul(state ^ (state >>> 15), 1 | state);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

// Invented surnames from sewing words, with common first names: no real person is meant.
const firstNames = [
  'Ada',
  'Ben',
  'Cora',
  'Dev',
  'Elsa',
  'Finn',
  'Gita',
  'Hugo',
  'Iris',
  'Jon',
  'Kira',
  'Leo',
  'Mina',
  'Nils',
  'Opal',
  'Pia',
  'Quin',
  'Rosa',
  'Sami',
  'Tess',
];
const surnames = [
  'Bobbinford',
  'Threadwell',
  'Hemsworthy',
  'Pleatley',
  'Smockton',
  'Seamsby',
  'Lacewing',
  'Quilterby',
  'Darnell',
  'Basting',
  'Tuckaway',
  'Gussetti',
  'Hoopley',
  'Spoolman',
  'Selvedge',
  'Ricrack',
  'Pinfold',
  'Thimbleby',
  'Yokefield',
  'Bias',
];
// A studio with 50,000 orders in two years ships about 70 a day, so a few hundred are in the making at any time.
const statuses = [
  ['shipped', 0.855],
  ['cancelled', 0.07],
  ['refunded', 0.02],
  ['awaiting_payment', 0.025],
  ['authorized', 0.006],
  ['proof_sent', 0.006],
  ['changes_requested', 0.002],
  ['proof_approved', 0.002],
  ['in_production', 0.01],
  ['stitched', 0.004],
] as const;

async function fill(db: Db): Promise<void> {
  const next = random(20261201);
  const pick = <T>(items: readonly T[]) => items[Math.floor(next() * items.length)]!;
  const [{ maxUser }] = await db('users').max({ maxUser: 'id' });
  const customers = Array.from({ length: CUSTOMER_COUNT }, (_, i) => {
    const name = `${pick(firstNames)} ${pick(surnames)}`;
    return { email: `${name.toLowerCase().replace(' ', '.')}.${i}@bench.test`, name, role: 'customer' };
  });
  for (let i = 0; i < customers.length; i += CHUNK) await db('users').insert(customers.slice(i, i + CHUNK));
  const customerIds = Array.from({ length: CUSTOMER_COUNT }, (_, i) => Number(maxUser) + 1 + i);
  const items = await db('order_items as i')
    .join('orders as o', 'o.id', 'i.order_id')
    .select('o.quote_id', 'i.design_id', 'i.garment_size_id', 'i.description');

  const todayMs = Date.parse(TODAY);
  for (let start = 0; start < ORDER_COUNT; start += CHUNK) {
    const orders = [];
    const lines = [];
    for (let n = start; n < Math.min(start + CHUNK, ORDER_COUNT); n += 1) {
      let roll = next();
      const status = statuses.find(([, share]) => (roll -= share) < 0)?.[0] ?? 'shipped';
      // Two years of history; orders still being made were placed in the last five weeks.
      const isOpen = !['shipped', 'cancelled', 'refunded'].includes(status);
      const placedMs = todayMs - Math.floor(next() * (isOpen ? 35 : 730)) * DAY_MS - Math.floor(next() * DAY_MS);
      const subtotal = 3000 + Math.floor(next() * 20_000);
      const tax = Math.round(subtotal * 0.07);
      const line = pick(items);
      orders.push({
        number: `WB-${20_001 + n}`,
        customer_id: pick(customerIds),
        quote_id: line.quote_id,
        status,
        payment_status:
          status === 'awaiting_payment'
            ? 'none'
            : ['authorized', 'proof_sent', 'changes_requested', 'proof_approved'].includes(status)
              ? 'authorized'
              : status === 'cancelled'
                ? 'voided'
                : status === 'refunded'
                  ? 'refunded'
                  : 'captured',
        subtotal_cents: subtotal,
        tax_cents: tax,
        total_cents: subtotal + tax,
        currency: 'USD',
        needed_by:
          next() < 0.4 ? new Date(placedMs + (10 + Math.floor(next() * 40)) * DAY_MS).toISOString().slice(0, 10) : null,
        ship_to: JSON.stringify({
          name: 'Bench Parent',
          line1: '1 Loom Lane',
          city: 'Benchton',
          region: 'OR',
          postalCode: '97000',
          countryCode: 'US',
        }),
        placed_at: status === 'awaiting_payment' ? null : new Date(placedMs),
        created_at: new Date(placedMs),
      });
      lines.push({
        design_id: line.design_id,
        garment_size_id: line.garment_size_id,
        quantity: 1 + Math.floor(next() * 3),
        unit_price_cents: subtotal,
        total_cents: subtotal,
        description: line.description,
      });
    }
    const [firstId] = await db('orders').insert(orders);
    await db('order_items').insert(lines.map((line, i) => ({ ...line, order_id: firstId! + i })));
  }
  await db.raw('ANALYZE TABLE orders, order_items, users, quotes');
}

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;
}

async function time(label: string, run: () => Promise<unknown>): Promise<void> {
  for (let i = 0; i < WARM_UP; i += 1) await run();
  const samples: number[] = [];
  for (let i = 0; i < SAMPLES; i += 1) {
    const start = performance.now();
    await run();
    samples.push(performance.now() - start);
  }
  samples.sort((a, b) => a - b);
  console.log(
    `${label.padEnd(58)} median ${percentile(samples, 50).toFixed(1).padStart(6)} ms   p95 ${percentile(samples, 95).toFixed(1).padStart(6)} ms`,
  );
}

const settings = { ...localDatabaseSettings(), databases: [DATABASE] };
const { started } = await startLocalDatabase(settings);
recreateLocalDatabase(DATABASE, settings);
const db = openDatabase(loadDatabaseConfig({ ...process.env, ...localStack('test').env, DB_NAME: DATABASE }));
try {
  await db.migrate.latest();
  await db.seed.run();
  const filledAt = performance.now();
  await fill(db);
  const [{ n }] = await db('orders').count({ n: '*' });
  console.log(
    `Filled ${DATABASE} with ${n} orders in ${((performance.now() - filledAt) / 1000).toFixed(1)} s; ${SAMPLES} runs of each query after ${WARM_UP} to warm up:\n`,
  );
  const board = (query: Record<string, string>) => () =>
    listBoardOrders(db, orderBoardQuery.parse(query) as OrderBoardQuery);
  await time('newest first, page 1 of 25', board({}));
  await time('newest first, page 40', board({ page: '40' }));
  await time(
    'needs a proof (authorized + changes requested), due soonest',
    board({ status: 'authorized,changes_requested', sort: 'due', dir: 'asc' }),
  );
  await time(
    'on the machine, by order number',
    board({ status: 'in_production,stitched', sort: 'number', dir: 'asc' }),
  );
  await time(
    'due in the next 14 days, soonest first',
    board({ dueFrom: TODAY, dueTo: '2026-12-14', sort: 'due', dir: 'asc' }),
  );
  await time('largest totals first', board({ sort: 'total', dir: 'desc' }));
  await time('by status', board({ sort: 'status', dir: 'asc' }));
  await time('search: order number prefix "WB-4512"', board({ q: 'WB-4512' }));
  await time('search: a surname word "thimbleby"', board({ q: 'thimbleby' }));
  await time('search: e-mail start "rosa.pleat"', board({ q: 'rosa.pleat' }));
  await time('calendar: open orders due in the next 6 weeks', () =>
    listDueCandidates(db, { from: TODAY, to: '2027-01-11' }, TODAY),
  );
} finally {
  await db.destroy();
  dropLocalDatabase(DATABASE, settings);
  if (started) await stopLocalDatabase(settings);
}
