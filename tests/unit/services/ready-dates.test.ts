import { describe, expect, it } from 'vitest';
import { addWorkingDays, shopToday, workOutReadyDates } from '../../../server/src/modules/quotes/ready-dates.ts';

// Weekdays checked against the Gregorian calendar: 1 December 2026 is a Tuesday.
describe('ready dates', () => {
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
    expect(addWorkingDays(from, days)).toBe(expected);
  });

  it('when the lead time is 10 working days, then a rush takes half of it, rounded up', () => {
    expect(workOutReadyDates('2026-12-01', 10)).toEqual({
      leadTimeDays: 10,
      earliestReadyDate: '2026-12-15',
      earliestRushDate: '2026-12-08',
    });
    expect(workOutReadyDates('2026-12-01', 7).earliestRushDate).toBe('2026-12-07');
  });

  it('when it is already the next day in UTC, then the shop’s own date is still today', () => {
    // 03:30 UTC on 2 December is 21:30 on 1 December in America/Chicago (UTC−6 in winter, IANA tz database).
    expect(shopToday(new Date('2026-12-02T03:30:00Z'), 'America/Chicago')).toBe('2026-12-01');
    expect(shopToday(new Date('2026-12-02T03:30:00Z'), 'UTC')).toBe('2026-12-02');
  });
});
