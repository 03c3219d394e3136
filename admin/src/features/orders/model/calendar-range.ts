// Straight from its module: the engine's entry also registers colour spaces at load, which the calendar does not need.
import { addCalendarDays, shopDayOf, weekStartOf } from '@server/engine/shop-calendar.ts';

/**
 * The calendar's days: from the Monday of the shop's week holding `nowMs` (the shop's day, in its time zone, as the
 * server's due dates are) for `weeks` whole weeks, YYYY-MM-DD, with the first and last day for the request.
 */
export function calendarRange(
  nowMs: number,
  weeks: number,
  timeZone: string,
): { from: string; to: string; days: string[] } {
  const monday = weekStartOf(shopDayOf(nowMs, timeZone));
  const days = Array.from({ length: weeks * 7 }, (_, i) => addCalendarDays(monday, i));
  return { from: days[0]!, to: days.at(-1)!, days };
}
