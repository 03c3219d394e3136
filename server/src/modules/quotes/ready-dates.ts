/**
 * When an order can be ready, counted in the shop's working days (its closed days of the week and holidays
 * stepped over) from today in the shop's own time zone, by the engine's shop calendar.
 */
import type { ReadyDates } from '../../contracts/stored-quotes.ts';
import { addWorkingDays, type ShopCalendar } from '../../engine/index.ts';

/**
 * The earliest ready dates for an order placed on the shop's day `today`. A rush order jumps the queue, so it takes
 * half the lead time, rounded up (common practice, no source).
 */
export function workOutReadyDates(today: string, schedule: ShopCalendar & { leadTimeDays: number }): ReadyDates {
  const { leadTimeDays } = schedule;
  return {
    leadTimeDays,
    earliestReadyDate: addWorkingDays(today, leadTimeDays, schedule),
    earliestRushDate: addWorkingDays(today, Math.ceil(leadTimeDays / 2), schedule),
  };
}
