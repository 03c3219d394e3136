import { beforeAll, describe, expect, it } from 'vitest';
import { adminOverviewResponse } from '../../server/src/contracts/admin-overview.ts';
import { useApiHarness, type ApiAgent } from '../support/api-harness.ts';
import { signedInAgent } from '../support/api-calls.ts';

const harness = useApiHarness();
let staff: ApiAgent;
beforeAll(async () => {
  staff = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
});

// The harness's clock reads Tuesday 1 December 2026, 10:00 UTC; the week began on Monday 30 November.
describe('GET /api/admin/overview', () => {
  it('when staff open Today, then each group lists the seeded orders that need that action', async () => {
    const body = adminOverviewResponse.parse((await staff.get('/api/admin/overview').expect(200)).body);
    expect(body.today).toBe('2026-12-01');
    const numbers = Object.fromEntries(
      body.actions.map((group) => [group.kind, group.orders.map((order) => order.number)]),
    );
    expect(numbers).toEqual({
      // WB-1009 places Harriet's granddaughter's drawing, and no stitch file has been entered for it yet.
      pictures_to_digitize: ['WB-1009'],
      proofs_to_send: ['WB-1009', 'WB-1010'],
      changes_asked: ['WB-1007'],
      awaiting_charge: ['WB-1006'],
      // WB-1006 has no date: placed Sunday 22 Nov + 10 working days = Friday 4 Dec; WB-1010 is needed by 6 Dec.
      due_soon: ['WB-1006', 'WB-1010'],
      ready_to_ship: ['WB-1003'],
    });
    expect(body.actions.find((group) => group.kind === 'due_soon')!.orders[0]).toMatchObject({
      dueDate: '2026-12-04',
      isOverdue: false,
    });
  });

  it('when the machine hours are booked by due week, then the sums match the quotes’ run minutes worked by hand', async () => {
    const { machineHours } = adminOverviewResponse.parse((await staff.get('/api/admin/overview').expect(200)).body);
    expect(machineHours.capacityHours).toBe(30);
    expect(machineHours.weeks.map((week) => week.weekStart)).toEqual([
      '2026-11-30',
      '2026-12-07',
      '2026-12-14',
      '2026-12-21',
      '2026-12-28',
      '2027-01-04',
    ]);
    // Thread changes between placements count (issue 12 §10), so designs with a border and a name take one change
    // (0.5 min) more than before.
    // Week of 30 Nov: WB-1006 42.85 + WB-1010 79.75 = 122.60 min = 2.0433 h.
    // Week of 7 Dec: WB-1004 35.14 + WB-1008 63.77 + WB-1009 17.63 (placed Thu 26 Nov + 10 working days = Thu 10 Dec)
    // + WB-1013 66.95 (needed by Thu 10 Dec) = 183.49 min = 3.0582 h.
    // Week of 14 Dec: WB-1007 48.10 min = 0.8017 h. WB-1003 is stitched, so it no longer books the machine.
    expect(machineHours.weeks.slice(0, 3)).toEqual([
      { weekStart: '2026-11-30', bookedHours: 2.04, orderCount: 2 },
      { weekStart: '2026-12-07', bookedHours: 3.06, orderCount: 4 },
      { weekStart: '2026-12-14', bookedHours: 0.8, orderCount: 1 },
    ]);
  });

  it('when takings are summed by week, then captures minus refunds match the seeded payments', async () => {
    const { revenue } = adminOverviewResponse.parse((await staff.get('/api/admin/overview').expect(200)).body);
    expect(revenue.currency).toBe('USD');
    expect(revenue.weeks).toHaveLength(8);
    const byWeek = Object.fromEntries(revenue.weeks.map((week) => [week.weekStart, week]));
    // The seeded orders carry their delivery (6.95 under 75.00 of goods, free from it) and the thread changes
    // between placements (issue 12 §9 and §10).
    // Week of 9 Nov: 29.42 + 40.66 + 85.51 = 155.59 captured.
    expect(byWeek['2026-11-09']).toEqual({
      weekStart: '2026-11-09',
      capturedCents: 15_559,
      refundedCents: 0,
      netCents: 15_559,
    });
    // Week of 16 Nov: 84.58 + 81.85 + 87.87 (WB-1013, 19 Nov) = 254.30 captured; refunds 84.58 (WB-1005) + 5.00 (WB-1002) =
    // 89.58; net 164.72.
    expect(byWeek['2026-11-16']).toEqual({
      weekStart: '2026-11-16',
      capturedCents: 25_430,
      refundedCents: 8958,
      netCents: 16_472,
    });
    expect(byWeek['2026-11-30']).toEqual({ weekStart: '2026-11-30', capturedCents: 0, refundedCents: 0, netCents: 0 });
  });

  it('when a customer asks, then it answers 403', async () => {
    const customer = harness.agent();
    await harness.signIn(customer, 'dominic@example.test');
    await customer.get('/api/admin/overview').expect(403);
  });
});
