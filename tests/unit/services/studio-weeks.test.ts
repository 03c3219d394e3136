import { describe, expect, it } from 'vitest';
import {
  bookMachineHours,
  dueDateOf,
  sumRevenueByWeek,
  weekStartOf,
} from '../../../server/src/modules/studio/studio-weeks.ts';

// 2 December 2026 is a Wednesday (checked against a printed 2026 calendar: 1 Dec is a Tuesday).
const wednesday = new Date('2026-12-02T15:00:00Z');

describe('weekStartOf', () => {
  it.each([
    ['2026-11-30T00:00:00Z', '2026-11-30'], // Monday itself
    ['2026-12-02T15:00:00Z', '2026-11-30'],
    ['2026-12-06T23:59:59Z', '2026-11-30'], // Sunday still belongs to the week that began on Monday
    ['2026-12-07T00:00:00Z', '2026-12-07'],
    ['2027-01-01T10:00:00Z', '2026-12-28'], // across a year end
  ])('when the instant is %s, then the week starts on %s', (instant, monday) => {
    expect(weekStartOf(new Date(instant))).toBe(monday);
  });
});

describe('dueDateOf', () => {
  it('when 10 working days follow a Sunday, then weekends are skipped: Sunday 22 Nov + 10 = Friday 4 Dec', () => {
    // Mon 23 … Fri 27 is 5, Mon 30 … Fri 4 is 10.
    expect(dueDateOf({ neededBy: null, placedAt: new Date('2026-11-22T03:02:00Z') }, 10)).toBe('2026-12-04');
  });

  it('when the customer gave a date, then it is the due date; otherwise placed + lead time; unplaced orders have none', () => {
    expect(dueDateOf({ neededBy: '2026-12-20', placedAt: new Date('2026-11-01T00:00:00Z') }, 10)).toBe('2026-12-20');
    expect(dueDateOf({ neededBy: null, placedAt: new Date('2026-11-27T12:00:00Z') }, 1)).toBe('2026-11-30'); // Friday + 1 = Monday
    expect(dueDateOf({ neededBy: null, placedAt: null }, 10)).toBeNull();
  });
});

describe('bookMachineHours', () => {
  it('when orders are due in three weeks, then each week sums its minutes as hours, overdue work lands in this week and later work is left out', () => {
    const weeks = bookMachineHours(
      [
        { runMinutes: 90, neededBy: '2026-12-04', placedAt: null }, // this week: 90 min = 1.5 h
        { runMinutes: 30, neededBy: '2026-11-20', placedAt: null }, // overdue: still this week, 0.5 h
        { runMinutes: 45, neededBy: '2026-12-07', placedAt: null }, // next Monday: 0.75 h
        { runMinutes: 45, neededBy: '2026-12-13', placedAt: null }, // next Sunday: same week, 0.75 + 0.75 = 1.5 h
        { runMinutes: 100, neededBy: null, placedAt: new Date('2026-12-01T09:00:00Z') }, // Tue + 10 working days = Tue 15 Dec: 100 min = 1.67 h
        { runMinutes: 600, neededBy: '2027-03-01', placedAt: null }, // beyond the three weeks shown
        { runMinutes: 60, neededBy: null, placedAt: null }, // not placed: no due date, not booked
      ],
      { now: wednesday, weekCount: 3, leadTimeDays: 10 },
    );
    expect(weeks).toEqual([
      { weekStart: '2026-11-30', bookedHours: 2, orderCount: 2 }, // 90 + 30 = 120 min = 2 h
      { weekStart: '2026-12-07', bookedHours: 1.5, orderCount: 2 }, // 45 + 45 = 90 min = 1.5 h
      { weekStart: '2026-12-14', bookedHours: 1.67, orderCount: 1 }, // 100 / 60 = 1.666… → 1.67
    ]);
  });

  it('when nothing is booked, then every week is shown with zero hours', () => {
    expect(bookMachineHours([], { now: wednesday, weekCount: 2, leadTimeDays: 10 })).toEqual([
      { weekStart: '2026-11-30', bookedHours: 0, orderCount: 0 },
      { weekStart: '2026-12-07', bookedHours: 0, orderCount: 0 },
    ]);
  });
});

describe('sumRevenueByWeek', () => {
  it('when captures and refunds fall in different weeks, then each week nets its own and older money is left out', () => {
    const weeks = sumRevenueByWeek(
      [
        { at: new Date('2026-11-16T14:30:00Z'), amountCents: 8458 },
        { at: new Date('2026-11-18T15:00:00Z'), amountCents: 7490 },
        { at: new Date('2026-12-01T10:00:00Z'), amountCents: 2500 },
        { at: new Date('2026-10-01T10:00:00Z'), amountCents: 99_999 }, // before the window
      ],
      [
        { at: new Date('2026-11-17T15:12:00Z'), amountCents: 8458 },
        { at: new Date('2026-11-24T15:05:00Z'), amountCents: 500 }, // a refund in a week with no takings
      ],
      { now: wednesday, weekCount: 3 },
    );
    expect(weeks).toEqual([
      // 8,458 + 7,490 = 15,948 captured; 15,948 − 8,458 = 7,490 net.
      { weekStart: '2026-11-16', capturedCents: 15_948, refundedCents: 8458, netCents: 7490 },
      { weekStart: '2026-11-23', capturedCents: 0, refundedCents: 500, netCents: -500 },
      { weekStart: '2026-11-30', capturedCents: 2500, refundedCents: 0, netCents: 2500 },
    ]);
  });
});
