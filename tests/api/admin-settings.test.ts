import { beforeAll, describe, expect, it } from 'vitest';
import { shopSettingsResponse, type ShopSettings } from '../../server/src/contracts/admin-settings.ts';
import { quotePreviewResponse } from '../../server/src/contracts/quotes.ts';
import { daisyDressQuote } from '../support/sample-designs.ts';
import { useApiHarness, type ApiAgent } from '../support/api-harness.ts';

const harness = useApiHarness();
let owner: ApiAgent;
let staff: ApiAgent;
beforeAll(async () => {
  owner = harness.agent();
  staff = harness.agent();
  await harness.signIn(owner, 'marigold@wrenandbobbin.test');
  await harness.signIn(staff, 'tobias@wrenandbobbin.test');
});

const seeded: ShopSettings = {
  machineStitchesPerMinute: 650,
  minutesPerHooping: 4,
  minutesPerColourChange: 0.5,
  setupMinutes: 10,
  leadTimeDays: 10,
  machineHoursPerWeek: 30,
  timeZone: 'America/Chicago',
  closedWeekdays: [0, 6],
  holidays: [],
};

const runTime = async () =>
  quotePreviewResponse.parse((await harness.agent().post('/api/quotes/preview').send(daisyDressQuote).expect(200)).body)
    .runMinutes;

describe('/api/admin/settings', () => {
  it('when staff read the settings, then they see the seeded values and may not edit them', async () => {
    expect(shopSettingsResponse.parse((await staff.get('/api/admin/settings').expect(200)).body)).toEqual({
      settings: seeded,
      canEdit: false,
    });
    const res = await staff.put('/api/admin/settings').send(seeded).expect(403);
    expect(res.body.error.message).toBe('Only the studio owner can change the shop settings.');
  });

  it('when a customer asks, then both routes answer 403', async () => {
    const customer = harness.agent();
    await harness.signIn(customer, 'harriet@example.test');
    await customer.get('/api/admin/settings').expect(403);
    await customer.put('/api/admin/settings').send(seeded).expect(403);
  });

  it('when the owner sends a zero speed, negative minutes and a 200-hour week, then it answers 400 naming each field', async () => {
    const res = await owner
      .put('/api/admin/settings')
      .send({
        ...seeded,
        machineStitchesPerMinute: 0,
        minutesPerHooping: -1,
        machineHoursPerWeek: 200,
        leadTimeDays: 2.5,
      })
      .expect(400);
    expect(res.body.error.fields).toMatchObject({
      machineStitchesPerMinute: 'A machine sews at least 50 stitches a minute',
      minutesPerHooping: "Time per hooping can't be negative",
      machineHoursPerWeek: 'A week has 168 hours',
      leadTimeDays: 'Use whole working days',
    });
  });

  it('when the owner closes the shop on 9 December and sends a made-up zone and a 31 November, then the zone and day are refused, and the holiday pushes the ready date', async () => {
    const readyDates = async () => (await harness.agent().get('/api/quotes/ready-dates').expect(200)).body;
    // The harness clock is Tuesday 1 December 04:00 in Chicago: 10 working days on is Tuesday 15 December.
    expect(await readyDates()).toMatchObject({ earliestReadyDate: '2026-12-15', earliestRushDate: '2026-12-08' });
    const refused = await owner
      .put('/api/admin/settings')
      .send({ ...seeded, timeZone: 'Mars/Olympus', holidays: ['2026-11-31'] })
      .expect(400);
    expect(refused.body.error.fields).toMatchObject({
      timeZone: 'Use a time zone name like America/Chicago or Europe/London',
      'holidays.0': 'That day does not exist',
    });
    const closed = { ...seeded, holidays: ['2026-12-09'] };
    expect(
      shopSettingsResponse.parse((await owner.put('/api/admin/settings').send(closed).expect(200)).body).settings,
    ).toEqual(closed);
    // Wednesday 9 December is stepped over: the 10th working day is Wednesday 16; the rush's 5th is still the 8th.
    expect(await readyDates()).toMatchObject({ earliestReadyDate: '2026-12-16', earliestRushDate: '2026-12-08' });
    await owner.put('/api/admin/settings').send(seeded).expect(200);
  });

  it('when the owner slows the machine and lengthens hooping, then quotes’ run-time estimates use the new pace at once', async () => {
    const before = await runTime();
    const sewing = (estimate: typeof before) => estimate.items.find((item) => item.code === 'sewing')!;
    const hooping = (estimate: typeof before) => estimate.items.find((item) => item.code === 'hoopings')!;
    const changed = { ...seeded, machineStitchesPerMinute: 325, minutesPerHooping: 6 };
    expect(
      shopSettingsResponse.parse((await owner.put('/api/admin/settings').send(changed).expect(200)).body).settings,
    ).toEqual(changed);

    const after = await runTime();
    // Half the speed doubles the sewing minutes (stitches ÷ stitches per minute); 4 hoopings × 6 min = 24 min.
    expect(sewing(after).minutes).toBeCloseTo(sewing(before).minutes * 2, 9);
    expect(hooping(before).minutes).toBe(16);
    expect(hooping(after).minutes).toBe(24);
    expect(after.totalMinutes).toBeGreaterThan(before.totalMinutes);
  });
});
