import { beforeAll, describe, expect, it } from 'vitest';
import { orderBoardResponse, dueOrdersResponse } from '../../server/src/contracts/studio-orders.ts';
import { adminOverviewResponse } from '../../server/src/contracts/admin-overview.ts';
import { customerOrderResponse } from '../../server/src/contracts/orders.ts';
import { useApiHarness, type ApiAgent } from '../support/api-harness.ts';

// 01:30 UTC on Wednesday 2 December is 19:30 on Tuesday 1 December in the shop's America/Chicago (UTC−6 in winter,
// IANA tz database): the shop's day is still the 1st, though UTC's is already the 2nd.
const harness = useApiHarness({ now: () => new Date('2026-12-02T01:30:00Z') });
let staff: ApiAgent;

beforeAll(async () => {
  staff = harness.agent();
  await harness.signIn(staff, 'tobias@wrenandbobbin.test');
  // WB-1004 (on the machine) is asked for today; WB-1006 (proof approved) has no date asked for and its card was
  // held at 09:00 in Chicago on Tuesday 17 November, so 10 working days on (Mon–Fri) it is due today too:
  // 18, 19, 20, 23, 24, 25, 26, 27, 30 November and 1 December. WB-1003 (stitched) was asked for yesterday.
  await harness.db('orders').where({ number: 'WB-1004' }).update({ needed_by: '2026-12-01' });
  await harness
    .db('orders')
    .where({ number: 'WB-1006' })
    .update({ needed_by: null, placed_at: new Date('2026-11-17T15:00:00Z') });
  await harness.db('orders').where({ number: 'WB-1003' }).update({ needed_by: '2026-11-30' });
});

const boardRow = async (number: string) =>
  orderBoardResponse.parse((await staff.get(`/api/admin/orders?q=${number}`).expect(200)).body).rows[0]!;

describe('the shop’s day', () => {
  it('when an order is due today in the shop and it is evening there (past midnight UTC), then the board does not call it overdue', async () => {
    expect(await boardRow('WB-1004')).toMatchObject({ dueDate: '2026-12-01', isOverdue: false });
    expect(await boardRow('WB-1006')).toMatchObject({ neededBy: null, dueDate: '2026-12-01', isOverdue: false });
    expect(await boardRow('WB-1003')).toMatchObject({ dueDate: '2026-11-30', isOverdue: true });
  });

  it('when the due-date calendar opens on the shop’s week, then today is the shop’s and the lead-time order is on its day', async () => {
    const due = dueOrdersResponse.parse(
      (await staff.get('/api/admin/orders/due?from=2026-11-30&to=2026-12-06').expect(200)).body,
    );
    expect(due.today).toBe('2026-12-01');
    const onTheFirst = due.orders.filter((order) => order.dueDate === '2026-12-01');
    expect(onTheFirst.map((order) => [order.number, order.isOverdue])).toEqual([
      ['WB-1004', false],
      ['WB-1006', false],
    ]);
    expect(due.orders.find((order) => order.number === 'WB-1003')).toMatchObject({ isOverdue: true });
  });

  it('when Today lists what is due soon, then the same orders are due today and not overdue', async () => {
    const overview = adminOverviewResponse.parse((await staff.get('/api/admin/overview').expect(200)).body);
    expect(overview.today).toBe('2026-12-01');
    const dueSoon = overview.actions.find((group) => group.kind === 'due_soon')!.orders;
    for (const number of ['WB-1004', 'WB-1006'])
      expect(dueSoon.find((order) => order.number === number)).toMatchObject({
        dueDate: '2026-12-01',
        isOverdue: false,
      });
  });

  it('when the customer opens the lead-time order, then their page gives the same due date', async () => {
    const dominic = harness.agent();
    await harness.signIn(dominic, 'dominic@example.test');
    const page = customerOrderResponse.parse((await dominic.get('/api/orders/WB-1006').expect(200)).body);
    expect(page.order).toMatchObject({ neededBy: null, dueDate: '2026-12-01' });
  });
});
