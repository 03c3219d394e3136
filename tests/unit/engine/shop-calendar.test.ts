import { describe, expect, it } from 'vitest';
import {
  addWorkingDays,
  dueDateOf,
  isPastDue,
  shopDayOf,
  weekStartOf,
} from '../../../server/src/engine/shop-calendar.ts';
import { workOutReadyDates } from '../../../server/src/modules/quotes/ready-dates.ts';

// Weekdays checked against the Gregorian calendar: 1 December 2026 is a Tuesday, 25 December a Friday.
const weekends = { closedWeekdays: [0, 6], holidays: [] };
const chicago = { timeZone: 'America/Chicago', ...weekends, leadTimeDays: 10 };

describe('addWorkingDays', () => {
  it.each([
    ['2026-12-01', 0, '2026-12-01'],
    ['2026-12-01', 1, '2026-12-02'],
    ['2026-12-01', 4, '2026-12-07'],
    ['2026-12-01', 10, '2026-12-15'],
    ['2026-12-05', 0, '2026-12-07'],
    ['2026-12-05', 1, '2026-12-07'],
    ['2026-12-05', 2, '2026-12-08'],
    ['2026-12-31', 1, '2027-01-01'],
  ])('when %s moves on %i working days, then it lands on %s (weekends skipped)', (from, days, expected) => {
    expect(addWorkingDays(from, days, weekends)).toBe(expected);
  });

  it('when the shop is shut on Christmas Day and Boxing Day falls on a Saturday, then a ready date steps over both', () => {
    // Tue 22 + 3 working days is Fri 25 with the weekend closed; with 25 Dec a holiday it is Mon 28.
    expect(addWorkingDays('2026-12-22', 3, weekends)).toBe('2026-12-25');
    expect(addWorkingDays('2026-12-22', 3, { ...weekends, holidays: ['2026-12-25'] })).toBe('2026-12-28');
    // A shop that also closes on Mondays: Tue 29.
    expect(addWorkingDays('2026-12-22', 3, { closedWeekdays: [0, 1, 6], holidays: ['2026-12-25'] })).toBe('2026-12-29');
  });

  it('when the shop is shut every day of the week, then the count still ends', () => {
    expect(addWorkingDays('2026-12-01', 2, { closedWeekdays: [0, 1, 2, 3, 4, 5, 6], holidays: [] })).toMatch(
      /^\d{4}-\d{2}-\d{2}$/,
    );
  });

  it('when the clocks change in the shop’s zone, then days are still whole days', () => {
    // 8 March 2026 is when the US moves to daylight time (a 23-hour day in Chicago); Fri 6 + 1 is still Mon 9.
    expect(addWorkingDays('2026-03-06', 1, weekends)).toBe('2026-03-09');
  });
});

describe('workOutReadyDates', () => {
  it('when the lead time is 10 working days, then a rush takes half of it, rounded up', () => {
    expect(workOutReadyDates('2026-12-01', { ...chicago, leadTimeDays: 10 })).toEqual({
      leadTimeDays: 10,
      earliestReadyDate: '2026-12-15',
      earliestRushDate: '2026-12-08',
    });
    expect(workOutReadyDates('2026-12-01', { ...chicago, leadTimeDays: 7 }).earliestRushDate).toBe('2026-12-07');
  });

  it('when a holiday falls inside the lead time, then the ready date moves on a working day', () => {
    const holiday = { ...chicago, holidays: ['2026-12-09'] };
    expect(workOutReadyDates('2026-12-01', holiday).earliestReadyDate).toBe('2026-12-16');
    expect(workOutReadyDates('2026-12-01', holiday).earliestRushDate).toBe('2026-12-08');
  });
});

describe('shopDayOf', () => {
  it('when it is already the next day in UTC, then the shop’s own date is still today', () => {
    // 03:30 UTC on 2 December is 21:30 on 1 December in America/Chicago (UTC−6 in winter, IANA tz database).
    expect(shopDayOf(Date.parse('2026-12-02T03:30:00Z'), 'America/Chicago')).toBe('2026-12-01');
    expect(shopDayOf(Date.parse('2026-12-02T03:30:00Z'), 'UTC')).toBe('2026-12-02');
    // Tokyo is UTC+9 with no daylight time: 16:00 UTC on 1 December is already 2 December there.
    expect(shopDayOf(Date.parse('2026-12-01T16:00:00Z'), 'Asia/Tokyo')).toBe('2026-12-02');
  });
});

describe('dueDateOf', () => {
  it('when 10 working days follow a Sunday, then weekends are skipped: Sunday 22 Nov + 10 = Friday 4 Dec', () => {
    // Mon 23 … Fri 27 is 5, Mon 30 … Fri 4 is 10. 03:02 UTC on the 22nd is still Saturday the 21st in Chicago, and
    // Saturday + 10 working days is the same Friday.
    expect(dueDateOf({ neededBy: null, placedAtMs: Date.parse('2026-11-22T03:02:00Z') }, chicago)).toBe('2026-12-04');
  });

  it('when a card is held on Friday evening in the shop, then the lead time counts from Friday, not from Saturday in UTC', () => {
    // 20:00 in Chicago on Friday 27 Nov is 02:00 UTC on Saturday 28: Friday + 1 working day is Monday 30 either
    // way, but with a 0-day lead the shop's Friday stays Friday while UTC's Saturday would move on to Monday.
    const evening = Date.parse('2026-11-28T02:00:00Z');
    expect(dueDateOf({ neededBy: null, placedAtMs: evening }, { ...chicago, leadTimeDays: 1 })).toBe('2026-11-30');
    expect(dueDateOf({ neededBy: null, placedAtMs: evening }, { ...chicago, leadTimeDays: 0 })).toBe('2026-11-27');
  });

  it('when the customer gave a date, then it is the due date; unplaced orders without one have none', () => {
    expect(dueDateOf({ neededBy: '2026-12-20', placedAtMs: Date.parse('2026-11-01T00:00:00Z') }, chicago)).toBe(
      '2026-12-20',
    );
    expect(dueDateOf({ neededBy: null, placedAtMs: null }, chicago)).toBeNull();
  });

  it('when an order is due today in the shop and it is evening there (past midnight UTC), then it is not overdue', () => {
    // 19:30 in Chicago on Tuesday 1 December is 01:30 UTC on Wednesday 2 December.
    const today = shopDayOf(Date.parse('2026-12-02T01:30:00Z'), chicago.timeZone);
    expect(today).toBe('2026-12-01');
    expect(isPastDue('2026-12-01', today)).toBe(false);
    expect(isPastDue('2026-11-30', today)).toBe(true);
  });
});

describe('weekStartOf', () => {
  it.each([
    ['2026-11-30', '2026-11-30'], // Monday itself
    ['2026-12-02', '2026-11-30'],
    ['2026-12-06', '2026-11-30'], // Sunday still belongs to the week that began on Monday
    ['2026-12-07', '2026-12-07'],
    ['2027-01-01', '2026-12-28'], // across a year end
  ])('when the day is %s, then the week starts on %s', (day, monday) => {
    expect(weekStartOf(day)).toBe(monday);
  });
});
