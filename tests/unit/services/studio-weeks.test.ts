import { describe, expect, it } from 'vitest';
import { bookMachineHours, sumRevenueByWeek } from '../../../server/src/modules/studio/studio-weeks.ts';

// 2 December 2026 is a Wednesday (checked against a printed 2026 calendar: 1 Dec is a Tuesday).
const wednesday = new Date('2026-12-02T15:00:00Z');
const schedule = { timeZone: 'America/Chicago', closedWeekdays: [0, 6], holidays: [], leadTimeDays: 10 };

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
      { now: wednesday, weekCount: 3, schedule },
    );
    expect(weeks).toEqual([
      { weekStart: '2026-11-30', bookedHours: 2, orderCount: 2 }, // 90 + 30 = 120 min = 2 h
      { weekStart: '2026-12-07', bookedHours: 1.5, orderCount: 2 }, // 45 + 45 = 90 min = 1.5 h
      { weekStart: '2026-12-14', bookedHours: 1.67, orderCount: 1 }, // 100 / 60 = 1.666… → 1.67
    ]);
  });

  it('when it is Sunday evening in the shop but Monday in UTC, then the shop’s week is still the one that began last Monday', () => {
    // 20:00 in Chicago on Sunday 6 December is 02:00 UTC on Monday 7 December.
    const weeks = bookMachineHours([{ runMinutes: 60, neededBy: '2026-12-06', placedAt: null }], {
      now: new Date('2026-12-07T02:00:00Z'),
      weekCount: 1,
      schedule,
    });
    expect(weeks).toEqual([{ weekStart: '2026-11-30', bookedHours: 1, orderCount: 1 }]);
  });

  it('when nothing is booked, then every week is shown with zero hours', () => {
    expect(bookMachineHours([], { now: wednesday, weekCount: 2, schedule })).toEqual([
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
      { now: wednesday, weekCount: 3, timeZone: 'America/Chicago' },
    );
    expect(weeks).toEqual([
      // 8,458 + 7,490 = 15,948 captured; 15,948 − 8,458 = 7,490 net.
      { weekStart: '2026-11-16', capturedCents: 15_948, refundedCents: 8458, netCents: 7490 },
      { weekStart: '2026-11-23', capturedCents: 0, refundedCents: 500, netCents: -500 },
      { weekStart: '2026-11-30', capturedCents: 2500, refundedCents: 0, netCents: 2500 },
    ]);
  });
});
