import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type { Express } from 'express';
import type Stripe from 'stripe';
import {
  dueOrdersResponse,
  orderActionResponse,
  orderBoardResponse,
} from '../../server/src/contracts/studio-orders.ts';
import { fixedNow, type ApiHarness } from '../support/api-harness.ts';
import {
  approveLatestProofAsCustomer,
  holdCardAtFake,
  inAWeek,
  startStudioHarness,
} from '../support/studio-order-support.ts';

let studio: Awaited<ReturnType<typeof startStudioHarness>>;
let harness: ApiHarness;
let fake: typeof studio.fake;
let stripe: Stripe;
let staff: ReturnType<ApiHarness['agent']>;

beforeAll(async () => {
  studio = await startStudioHarness('sk_test_studio_orders');
  ({ harness, fake, stripe, staff } = studio);
});
afterAll(async () => {
  await studio.close();
});

const board = async (query: string) =>
  orderBoardResponse.parse((await staff.get(`/api/admin/orders${query}`).expect(200)).body);
const numbers = (response: { rows: { number: string }[] }) => response.rows.map((row) => row.number);

describe('GET /api/admin/orders (the board)', () => {
  it('when staff open the board, then every order is listed newest first with its customer, money and items, unpaid ones last', async () => {
    const page = await board('');
    expect(page.total).toBe(13);
    expect(page).toMatchObject({ page: 1, pageSize: 25 });
    const placed = page.rows.map((row) => row.placedAt).filter((at) => at !== null);
    expect(placed).toEqual([...placed].sort().reverse());
    expect(page.rows.at(-1)).toMatchObject({ number: 'WB-1012', status: 'awaiting_payment', placedAt: null });
    const clara = page.rows.find((row) => row.number === 'WB-1010')!;
    expect(clara).toMatchObject({
      status: 'authorized',
      paymentStatus: 'authorized',
      neededBy: '2026-12-06',
      currency: 'USD',
    });
    expect(clara.itemSummary).toMatch(/^\d+ × /);
    expect(clara.customer.email).toMatch(/@example\.test$/);
  });

  it('when staff filter by several statuses, then only those orders are listed, with either way of writing them', async () => {
    const joined = await board('?status=authorized,proof_sent');
    expect(new Set(joined.rows.map((row) => row.status))).toEqual(new Set(['authorized', 'proof_sent']));
    const repeated = await board('?status=authorized&status=proof_sent');
    expect(numbers(repeated).sort()).toEqual(numbers(joined).sort());
    expect(joined.total).toBe(3);
  });

  it('when staff search, then order numbers match by their start and customers by their e-mail or any word of their name', async () => {
    expect(numbers(await board('?q=WB-100&sort=number&dir=asc'))).toEqual([
      'WB-1001',
      'WB-1002',
      'WB-1003',
      'WB-1004',
      'WB-1005',
      'WB-1006',
      'WB-1007',
      'WB-1008',
      'WB-1009',
    ]);
    expect(numbers(await board('?q=1007'))).toEqual(['WB-1007']);
    const bySurname = await board('?q=castell');
    expect(bySurname.total).toBeGreaterThan(0);
    expect(bySurname.rows.every((row) => row.customer.name === 'Priya Castellanos')).toBe(true);
    const byEmail = await board('?q=harriet@');
    expect(byEmail.rows.every((row) => row.customer.email === 'harriet@example.test')).toBe(true);
    expect((await board('?q=nobody-by-this-name')).total).toBe(0);
    // Search syntax is only text: operators of the FULLTEXT search are not passed through.
    expect((await board('?q=%2Bpriya%20-castellanos*')).total).toBe(bySurname.total);
  });

  it('when staff filter by due dates and a customer, then the range is inclusive and the customer’s orders alone are listed', async () => {
    const due = await board('?dueFrom=2026-12-05&dueTo=2026-12-06&sort=due&dir=asc');
    expect(numbers(due)).toEqual(['WB-1003', 'WB-1010']);
    const { customer } = due.rows[0]!;
    const theirs = await board(`?customer=${customer.id}`);
    expect(theirs.rows.every((row) => row.customer.id === customer.id)).toBe(true);
  });

  it('when staff sort and page, then pages follow the sort without repeating an order', async () => {
    const first = await board('?sort=total&dir=desc&pageSize=5');
    const third = await board('?sort=total&dir=desc&pageSize=5&page=3');
    expect(first.rows).toHaveLength(5);
    expect(third.rows).toHaveLength(3);
    const totals = first.rows.map((row) => row.totalCents);
    expect(totals).toEqual([...totals].sort((a, b) => b - a));
    const all = [
      ...numbers(first),
      ...numbers(await board('?sort=total&dir=desc&pageSize=5&page=2')),
      ...numbers(third),
    ];
    expect(new Set(all).size).toBe(13);
    const byStatus = await board('?sort=status&dir=asc&pageSize=100');
    expect(byStatus.rows[0]!.status).toBe('awaiting_payment');
    const byDue = await board('?sort=due&dir=asc');
    expect(byDue.rows.at(-1)!.neededBy).toBeNull();
  });

  it('when an open order’s due date has passed, then the board marks it overdue', async () => {
    await harness.db('orders').where({ number: 'WB-1009' }).update({ needed_by: '2026-11-28' });
    const [row] = (await board('?q=WB-1009')).rows;
    expect(row).toMatchObject({ neededBy: '2026-11-28', isOverdue: true });
    expect((await board('?q=WB-1001')).rows[0]!.isOverdue).toBe(false);
  });

  it('when the query is malformed, then it answers 400 naming the field', async () => {
    const cases: [string, string][] = [
      ['?status=bogus', 'status.0'],
      ['?sort=price', 'sort'],
      ['?dir=up', 'dir'],
      ['?pageSize=500', 'pageSize'],
      ['?page=0', 'page'],
      ['?dueFrom=2026-12-10&dueTo=2026-12-01', 'dueTo'],
      ['?dueFrom=tomorrow', 'dueFrom'],
      ['?customer=abc', 'customer'],
    ];
    for (const [query, field] of cases) {
      const res = await staff.get(`/api/admin/orders${query}`).expect(400);
      expect(Object.keys(res.body.error.fields), query).toContain(field);
    }
  });
});

describe('GET /api/admin/orders/due (the calendar)', () => {
  it('when staff ask for December, then open orders due in it come soonest first, with overdue ones before them', async () => {
    const due = dueOrdersResponse.parse(
      (await staff.get('/api/admin/orders/due?from=2026-12-01&to=2026-12-31').expect(200)).body,
    );
    expect(due.today).toBe('2026-12-01');
    // WB-1006 has no date asked for: it is due by the lead time, 10 working days after its card was held on
    // Saturday 21 November in Chicago, so on Friday 4 December.
    expect(due.orders.map((order) => order.number)).toEqual([
      'WB-1009',
      'WB-1006',
      'WB-1003',
      'WB-1010',
      'WB-1013',
      'WB-1004',
      'WB-1008',
      'WB-1007',
    ]);
    expect(due.orders[0]!.isOverdue).toBe(true);
    expect(due.orders[1]).toMatchObject({ neededBy: null, dueDate: '2026-12-04', isOverdue: false });
    expect(due.orders.every((order) => !['shipped', 'cancelled', 'refunded'].includes(order.status))).toBe(true);
  });

  it('when the range is backwards or too long, then it answers 400', async () => {
    await staff.get('/api/admin/orders/due?from=2026-12-31&to=2026-12-01').expect(400);
    const long = await staff.get('/api/admin/orders/due?from=2026-01-01&to=2026-12-31').expect(400);
    expect(long.body.error.fields.to).toMatch(/92 days/);
  });
});

describe('the studio moves an order along', () => {
  it('when staff proof, charge, stitch, ship and refund an order, then each step moves it and the customer hears of each', async () => {
    await staff
      .post('/api/admin/orders/WB-1009/proofs')
      .send({ source: 'render', message: 'Your sun, drawn on the romper.' })
      .expect(201);
    await approveLatestProofAsCustomer(harness.db, 'WB-1009', fixedNow());
    await holdCardAtFake(harness.db, stripe, 'WB-1009', inAWeek);
    const charged = orderActionResponse.parse((await staff.post('/api/admin/orders/WB-1009/capture').expect(200)).body);
    expect(charged.status).toBe('in_production');

    expect((await staff.post('/api/admin/orders/WB-1009/stitched').expect(200)).body.status).toBe('stitched');
    const shipped = await staff
      .post('/api/admin/orders/WB-1009/shipped')
      .send({ trackingNumber: 'LOCAL 0042' })
      .expect(200);
    expect(shipped.body.status).toBe('shipped');

    const partial = orderActionResponse.parse(
      (
        await staff
          .post('/api/admin/orders/WB-1009/refunds')
          .send({ amountCents: 500, reason: 'The parcel was late.' })
          .expect(200)
      ).body,
    );
    expect(partial).toMatchObject({ status: 'shipped', paymentStatus: 'partially_refunded', refundedCents: 500 });
    const tooMuch = await staff
      .post('/api/admin/orders/WB-1009/refunds')
      .send({ amountCents: charged.capturedCents, reason: 'All of it' })
      .expect(400);
    expect(tooMuch.body.error.fields.amountCents).toMatch(/at most/);
    const rest = orderActionResponse.parse(
      (
        await staff
          .post('/api/admin/orders/WB-1009/refunds')
          .send({ reason: 'The romper was stitched on the wrong size.' })
          .expect(200)
      ).body,
    );
    expect(rest).toMatchObject({ status: 'refunded', paymentStatus: 'refunded', refundedCents: charged.capturedCents });

    const order = await harness.db('orders').where({ number: 'WB-1009' }).first('id');
    const templates = (await harness
      .db('email_log')
      .where({ order_id: order.id })
      .orderBy('id')
      .pluck('template')) as string[];
    expect(templates.slice(-5)).toEqual([
      'proof_ready',
      'card_charged',
      'order_shipped',
      'refund_issued',
      'refund_issued',
    ]);
    const shippedMail = await harness
      .db('email_log')
      .where({ order_id: order.id, template: 'order_shipped' })
      .first('text_body');
    expect(shippedMail.text_body).toContain('LOCAL 0042');
    const refunds = [...fake.state.refunds.values()].map((refund) => refund.amount);
    expect(refunds).toEqual([500, charged.capturedCents - 500]);
    const types = (await harness
      .db('order_events')
      .where({ order_id: order.id })
      .orderBy('id')
      .pluck('type')) as string[];
    expect(types.slice(-6)).toEqual([
      'proof_approved',
      'payment_captured',
      'stitched',
      'shipped',
      'refunded',
      'refunded',
    ]);
  });

  it('when staff cancel an order with a held card, then the hold is released, the order is cancelled and the customer told', async () => {
    const intentId = await holdCardAtFake(harness.db, stripe, 'WB-1010', inAWeek);
    const res = await staff
      .post('/api/admin/orders/WB-1010/cancel')
      .send({ reason: 'The party was called off.' })
      .expect(200);
    expect(orderActionResponse.parse(res.body)).toMatchObject({ status: 'cancelled', paymentStatus: 'voided' });
    expect(fake.state.paymentIntents.get(intentId)!.status).toBe('canceled');
    const order = await harness.db('orders').where({ number: 'WB-1010' }).first('id');
    const mail = await harness
      .db('email_log')
      .where({ order_id: order.id, template: 'order_cancelled' })
      .first('text_body');
    expect(mail.text_body).toContain('The party was called off.');
    expect(mail.text_body).toContain('hold on your card has been released');
  });

  it('when an action does not fit where the order stands, then it answers 409 with the state machine’s reason', async () => {
    const cases: [string, object, RegExp][] = [
      ['/api/admin/orders/WB-1001/stitched', {}, /Only an order on the machine can be marked stitched/],
      ['/api/admin/orders/WB-1004/shipped', {}, /Only a stitched order can be shipped/],
      ['/api/admin/orders/WB-1004/cancel', { reason: 'Changed mind' }, /refund it instead of cancelling/],
      ['/api/admin/orders/WB-1008/refunds', { reason: 'Why not' }, /cancel it to release the card/],
      [
        '/api/admin/orders/WB-1011/cancel',
        { reason: 'Again' },
        /This order is cancelled; nothing more can be done to it/,
      ],
      ['/api/admin/orders/WB-1005/refunds', { reason: 'Again' }, /This order is refunded/],
    ];
    for (const [path, body, reason] of cases) {
      const res = await staff.post(path).send(body).expect(409);
      expect(res.body.error.message, path).toMatch(reason);
    }
  });

  it('when the order does not exist or a reason is missing, then it answers 404 or 400', async () => {
    await staff.post('/api/admin/orders/WB-9999/stitched').expect(404);
    const res = await staff.post('/api/admin/orders/WB-1008/cancel').send({}).expect(400);
    expect(res.body.error.fields).toHaveProperty('reason');
    await staff.post('/api/admin/orders/WB-1008/refunds').send({ amountCents: -5, reason: 'x' }).expect(400);
  });
});

/** Every route mounted under /api/admin, read from the app's own router, so a route added later is covered too. */
function adminRoutes(app: Express): { method: string; path: string }[] {
  interface Layer {
    rawPath?: string;
    route?: { path: string; methods: Record<string, boolean> };
    handle: { stack?: Layer[] };
  }
  const found: { method: string; path: string }[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      const path = typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : '';
      if (layer.route)
        for (const method of Object.keys(layer.route.methods))
          found.push({ method, path: layer.route.path === '/' ? prefix : prefix + layer.route.path });
      else if (layer.handle.stack) walk(layer.handle.stack, prefix + path);
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return found.filter((route) => route.path.startsWith('/api/admin'));
}

describe('who may use the studio’s routes', () => {
  const sample = (path: string) =>
    path
      .replace(':number', 'WB-1004')
      .replace(/:[a-zA-Z]+/g, '1')
      .replace(/\{?\/?\*[a-zA-Z]+\}?/g, '/x');

  it('when a customer or a signed-out visitor calls any admin route, then every one is refused (403 and 401) and nothing changes', async () => {
    const routes = adminRoutes(harness.app);
    const mine = [
      'get /api/admin/orders',
      'get /api/admin/orders/due',
      'post /api/admin/orders/:number/proofs',
      'get /api/admin/orders/:number/proofs/preview',
      'get /api/admin/orders/:number/proofs/:version/image',
      'post /api/admin/orders/:number/capture',
      'post /api/admin/orders/:number/cancel',
      'post /api/admin/orders/:number/refunds',
      'post /api/admin/orders/:number/stitched',
      'post /api/admin/orders/:number/shipped',
      'get /api/admin/orders/:number',
    ];
    expect(routes.map((route) => `${route.method} ${route.path}`)).toEqual(expect.arrayContaining(mine));
    const customer = harness.agent();
    await harness.signIn(customer, 'harriet@example.test');
    const before = await harness.db('orders').select('number', 'status', 'payment_status').orderBy('id');
    for (const { method, path } of routes) {
      const url = sample(path);
      const send = (client: ReturnType<typeof request.agent>) =>
        (client as unknown as Record<string, (url: string) => request.Test>)[method]!(url).send({
          reason: 'x',
          source: 'render',
          message: 'x',
        });
      expect((await send(customer)).status, `${method} ${url} as a customer`).toBe(403);
      expect(
        (await send(request.agent(harness.app).set('Origin', harness.config.appOrigin))).status,
        `${method} ${url} signed out`,
      ).toBe(401);
    }
    expect(await harness.db('orders').select('number', 'status', 'payment_status').orderBy('id')).toEqual(before);
  });

  it('when the owner uses the board, then it answers as it does for staff', async () => {
    const owner = harness.agent();
    await harness.signIn(owner, 'marigold@wrenandbobbin.test');
    expect(orderBoardResponse.parse((await owner.get('/api/admin/orders?pageSize=1').expect(200)).body).total).toBe(13);
  });
});
