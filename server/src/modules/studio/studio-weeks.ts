/**
 * The Today page's weekly figures, as pure functions of rows and "now": machine hours booked per week against
 * capacity, and takings per week. Weeks start on Monday and are counted in UTC, as every stored time is.
 */
import { addWorkingDays } from '../quotes/ready-dates.ts';
import type { MoneyMovement } from './studio-week-repo.ts';

export type { MoneyMovement };

const dayMs = 86_400_000;

/** The Monday (UTC) of the week holding `date`, as "YYYY-MM-DD". */
export function weekStartOf(date: Date): string {
  const midnight = Date.UTC(date.getUTCFullYear(), date.getUTCMonth(), date.getUTCDate());
  const daysSinceMonday = (new Date(midnight).getUTCDay() + 6) % 7;
  return new Date(midnight - daysSinceMonday * dayMs).toISOString().slice(0, 10);
}

const addWeeks = (weekStart: string, weeks: number) =>
  new Date(Date.parse(`${weekStart}T00:00:00Z`) + weeks * 7 * dayMs).toISOString().slice(0, 10);

/** An order still to be stitched, with its quote's machine minutes for the whole quantity. */
export interface BookedOrder {
  runMinutes: number;
  /** The date the customer needs it by ("YYYY-MM-DD"), if they gave one. */
  neededBy: string | null;
  /** When the card was held; null while awaiting payment. */
  placedAt: Date | null;
}

/** When an order is due: the customer's date, else the lead time in working days after it was placed. */
export function dueDateOf(order: Pick<BookedOrder, 'neededBy' | 'placedAt'>, leadTimeDays: number): string | null {
  if (order.neededBy) return order.neededBy;
  // The same working-day rule as the customer's ready dates, counted from the day (UTC) the card was held.
  return order.placedAt ? addWorkingDays(order.placedAt.toISOString().slice(0, 10), leadTimeDays) : null;
}

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
  options: { now: Date; weekCount: number; leadTimeDays: number },
): MachineWeek[] {
  const first = weekStartOf(options.now);
  const weeks = Array.from({ length: options.weekCount }, (_, i) => ({
    weekStart: addWeeks(first, i),
    minutes: 0,
    orderCount: 0,
  }));
  for (const order of orders) {
    const due = dueDateOf(order, options.leadTimeDays);
    if (!due) continue;
    const dueWeek = weekStartOf(new Date(`${due}T12:00:00Z`));
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
  options: { now: Date; weekCount: number },
): RevenueWeek[] {
  const last = weekStartOf(options.now);
  const weeks = Array.from({ length: options.weekCount }, (_, i) => ({
    weekStart: addWeeks(last, i - options.weekCount + 1),
    capturedCents: 0,
    refundedCents: 0,
  }));
  const weekOf = (at: Date) => weeks.find((week) => week.weekStart === weekStartOf(at));
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
