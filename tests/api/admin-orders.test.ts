import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { orderDetailResponse } from '../../server/src/contracts/admin-orders.ts';
import { useApiHarness, type ApiAgent } from '../support/api-harness.ts';
import { signedInAgent } from '../support/api-calls.ts';

const harness = useApiHarness();
let staff: ApiAgent;
beforeAll(async () => {
  staff = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
});

describe('GET /api/admin/orders/:number', () => {
  it('when staff open a seeded order, then its lines add up to the total and its history runs oldest first', async () => {
    const { order, quote, events, items } = orderDetailResponse.parse(
      (await staff.get('/api/admin/orders/WB-1004').expect(200)).body,
    );
    expect(order.number).toBe('WB-1004');
    expect(items.length).toBeGreaterThan(0);
    expect(quote.lines.reduce((sum, line) => sum + line.amountCents, 0)).toBe(order.totalCents);
    const times = events.map((event) => event.createdAt);
    expect([...times].sort()).toEqual(times);
  });

  it('when every seeded order is opened, then each one answers', async () => {
    const numbers = (await harness.db('orders').pluck('number')) as string[];
    for (const number of numbers) await staff.get(`/api/admin/orders/${number}`).expect(200);
  });

  it('when the order does not exist, then it answers 404 naming it', async () => {
    const res = await staff.get('/api/admin/orders/WB-9999').expect(404);
    expect(res.body.error.message).toBe('There is no order WB-9999.');
  });

  it('when the number is malformed, then it answers 400 with an example of the right form', async () => {
    const res = await staff.get('/api/admin/orders/drop%20table').expect(400);
    expect(res.body.error.fields.number).toMatch(/WB-1001/);
  });

  it('when a customer asks, even for their own order, then the studio view is refused', async () => {
    const customer = harness.agent();
    await harness.signIn(customer, 'harriet@example.test');
    await customer.get('/api/admin/orders/WB-1004').expect(403);
    await request(harness.app).get('/api/admin/orders/WB-1004').expect(401);
  });
});
