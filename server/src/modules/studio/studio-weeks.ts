/**
 * The Today page's weekly figures, as pure functions of rows, "now" and the shop's calendar: machine hours booked per
 * week against capacity, and takings per week. Weeks start on Monday and are counted in the shop's days (its time
 * zone), the same days as its due dates.
 */
import { addCalendarDays, dueDateOf, shopDayOf, weekStartOf, type ShopCalendar } from '../../engine/index.ts';
import type { MoneyMovement } from './studio-week-repo.ts';

export type { MoneyMovement };

const addWeeks = (weekStart: string, weeks: number) => addCalendarDays(weekStart, weeks * 7);

/** An order still to be stitched, with its quote's machine minutes for the whole quantity. */
export interface BookedOrder {
  runMinutes: number;
  /** The date the customer needs it by ("YYYY-MM-DD"), if they gave one. */
  neededBy: string | null;
  /** When the card was held; null while awaiting payment. */
  placedAt: Date | null;
}

/** The shop's calendar with its lead time: what every due date is worked out from. */
export type ShopSchedule = ShopCalendar & { leadTimeDays: number };

/** An order's due date by the engine's one rule (`dueDateOf`), from the row's own dates. */
export const dueDateOfRow = (order: Pick<BookedOrder, 'neededBy' | 'placedAt'>, schedule: ShopSchedule) =>
  dueDateOf({ neededBy: order.neededBy, placedAtMs: order.placedAt?.getTime() ?? null }, schedule);

export interface MachineWeek {
  weekStart: string;
  bookedHours: number;
  orderCount: number;
}

/**
 * Machine hours booked in each of `weekCount` weeks from this one, each order in the week it is due (see
 * `dueDateOf`). Work already overdue is counted in this week, because it still has to be stitched now; work due
 * after the last week is left out. Hours are rounded to 0.01 h only after summing minutes.
 */
export function bookMachineHours(
  orders: readonly BookedOrder[],
  options: { now: Date; weekCount: number; schedule: ShopSchedule },
): MachineWeek[] {
  const first = weekStartOf(shopDayOf(options.now.getTime(), options.schedule.timeZone));
  const weeks = Array.from({ length: options.weekCount }, (_, i) => ({
    weekStart: addWeeks(first, i),
    minutes: 0,
    orderCount: 0,
  }));
  for (const order of orders) {
    const due = dueDateOfRow(order, options.schedule);
    if (!due) continue;
    const dueWeek = weekStartOf(due);
    const week = dueWeek < first ? weeks[0] : weeks.find((candidate) => candidate.weekStart === dueWeek);
    if (!week) continue;
    week.minutes += order.runMinutes;
    week.orderCount += 1;
  }
  return weeks.map(({ weekStart, minutes, orderCount }) => ({
    weekStart,
    bookedHours: Math.round((minutes / 60) * 100) / 100,
    orderCount,
  }));
}

export interface RevenueWeek {
  weekStart: string;
  capturedCents: number;
  refundedCents: number;
  /** Captured minus refunded; negative in a week of more refunds than takings. */
  netCents: number;
}

/** Takings in each of the `weekCount` weeks up to and including this one: captured payments minus refunds. */
export function sumRevenueByWeek(
  captures: readonly MoneyMovement[],
  refunds: readonly MoneyMovement[],
  options: { now: Date; weekCount: number; timeZone: string },
): RevenueWeek[] {
  const weekOfMoment = (at: Date) => weekStartOf(shopDayOf(at.getTime(), options.timeZone));
  const last = weekOfMoment(options.now);
  const weeks = Array.from({ length: options.weekCount }, (_, i) => ({
    weekStart: addWeeks(last, i - options.weekCount + 1),
    capturedCents: 0,
    refundedCents: 0,
  }));
  const weekOf = (at: Date) => weeks.find((week) => week.weekStart === weekOfMoment(at));
  for (const capture of captures) {
    const week = weekOf(capture.at);
    if (week) week.capturedCents += capture.amountCents;
  }
  for (const refund of refunds) {
    const week = weekOf(refund.at);
    if (week) week.refundedCents += refund.amountCents;
  }
  return weeks.map((week) => ({ ...week, netCents: week.capturedCents - week.refundedCents }));
}
