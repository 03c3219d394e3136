import { beforeAll, describe, expect, it } from 'vitest';
import { outboxListResponse, outboxMessageResponse } from '../../server/src/contracts/admin-outbox.ts';
import { useApiHarness, type ApiAgent } from '../support/api-harness.ts';
import { signedInAgent } from '../support/api-calls.ts';

const harness = useApiHarness();
let staff: ApiAgent;
beforeAll(async () => {
  staff = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
});

describe('GET /api/admin/outbox', () => {
  it('when staff open the outbox, then the newest message comes first, 20 to a page, and the second page holds the rest', async () => {
    const first = outboxListResponse.parse((await staff.get('/api/admin/outbox').expect(200)).body);
    const total = Number((await harness.db('email_log').count({ n: '*' }))[0].n);
    expect(first).toMatchObject({ page: 1, pageSize: 20, total });
    expect(first.messages).toHaveLength(Math.min(20, total));
    const times = first.messages.map((m) => m.createdAt);
    expect([...times].sort().reverse()).toEqual(times);
    const second = outboxListResponse.parse((await staff.get('/api/admin/outbox?page=2').expect(200)).body);
    expect(second.messages).toHaveLength(total - 20);
    expect(second.messages.every((m) => m.createdAt <= times.at(-1)!)).toBe(true);
  });

  it('when filtered by order or by failed status, then only those messages come back, failures with their error', async () => {
    const forOrder = outboxListResponse.parse((await staff.get('/api/admin/outbox?order=wb-1008').expect(200)).body);
    expect(forOrder.messages.length).toBeGreaterThan(1);
    expect(forOrder.messages.every((m) => m.orderNumber === 'WB-1008')).toBe(true);
    const failed = outboxListResponse.parse((await staff.get('/api/admin/outbox?status=failed').expect(200)).body);
    expect(failed.total).toBeGreaterThan(0);
    expect(failed.messages.every((m) => m.status === 'failed' && m.error)).toBe(true);
  });

  it('when the filters are malformed, then it answers 400 naming the field', async () => {
    const res = await staff.get('/api/admin/outbox?order=1008&status=lost&page=0').expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['order', 'page', 'status']);
    expect(res.body.error.fields.order).toBe('Use an order number such as WB-1003');
  });

  it('when a message is opened, then its text comes back; an unknown one is 404', async () => {
    const [latest] = outboxListResponse.parse((await staff.get('/api/admin/outbox').expect(200)).body).messages;
    const { message } = outboxMessageResponse.parse(
      (await staff.get(`/api/admin/outbox/${latest!.id}`).expect(200)).body,
    );
    expect(message).toMatchObject({ id: latest!.id, subject: latest!.subject });
    expect(message.textBody).toContain(latest!.orderNumber);
    await staff.get('/api/admin/outbox/99999').expect(404);
  });

  it('when a customer asks, then it answers 403', async () => {
    const customer = harness.agent();
    await harness.signIn(customer, 'priya@example.test');
    await customer.get('/api/admin/outbox').expect(403);
    await customer.get('/api/admin/outbox/1').expect(403);
  });
});
