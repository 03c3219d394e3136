/**
 * The shop's calendar: one notion of "today" (the day it is where the shop is) and one rule for due dates, so the
 * studio's board, Today page and calendar and the customer's pages and e-mails all agree. Dates are calendar days,
 * YYYY-MM-DD. Moments are turned into the shop's day in its IANA time zone with date-fns and @date-fns/tz; days are
 * then counted in one fixed zone (UTC), where every day has 24 hours, so no daylight-saving change can move one.
 */
import { addDays, format, getDay, parseISO } from 'date-fns';
import { tz } from '@date-fns/tz';

/** The zone days are counted in once they are calendar days. */
const calendarDays = tz('UTC');
/** Longest run of closed days a count will step over, so a calendar closed on every day cannot loop for ever. */
const MAX_DAYS_STEPPED = 3660;

export interface ShopCalendar {
  /** The shop's IANA time zone, such as America/Chicago: where its day starts and ends. */
  timeZone: string;
  /** Days of the week the shop is shut, 0 Sunday to 6 Saturday. */
  closedWeekdays: readonly number[];
  /** Single days the shop is shut (holidays), YYYY-MM-DD. */
  holidays: readonly string[];
}

/** The calendar day it is where the shop is at a moment (ms since 1970 UTC, which callers pass in), YYYY-MM-DD. */
export function shopDayOf(atMs: number, timeZone: string): string {
  return format(atMs, 'yyyy-MM-dd', { in: tz(timeZone) });
}

/** The calendar day `days` days after `date` (before, when negative). */
export function addCalendarDays(date: string, days: number): string {
  return format(addDays(parseISO(date, { in: calendarDays }), days), 'yyyy-MM-dd', { in: calendarDays });
}

/** The Monday of the week holding the calendar day `date`. */
export function weekStartOf(date: string): string {
  const weekday = getDay(parseISO(date, { in: calendarDays }), { in: calendarDays });
  return addCalendarDays(date, -((weekday + 6) % 7));
}

/** Whether the shop works on `date`: not a closed day of the week, not a holiday. */
export function isWorkingDay(date: string, calendar: Pick<ShopCalendar, 'closedWeekdays' | 'holidays'>): boolean {
  const weekday = getDay(parseISO(date, { in: calendarDays }), { in: calendarDays });
  return !calendar.closedWeekdays.includes(weekday) && !calendar.holidays.includes(date);
}

/**
 * The working day `days` working days after `date`: closed days and holidays are stepped over (Friday + 1 is
 * Monday when the weekend is closed). With 0, a closed day moves on to the next working day.
 */
export function addWorkingDays(
  date: string,
  days: number,
  calendar: Pick<ShopCalendar, 'closedWeekdays' | 'holidays'>,
): string {
  let day = date;
  let left = days;
  for (let stepped = 0; (left > 0 || !isWorkingDay(day, calendar)) && stepped < days + MAX_DAYS_STEPPED; stepped++) {
    day = addCalendarDays(day, 1);
    if (isWorkingDay(day, calendar)) left -= 1;
  }
  return day;
}

/** An order as far as its due date goes. */
export interface DatedOrder {
  /** The date the customer needs it by, YYYY-MM-DD, if they gave one. */
  neededBy: string | null;
  /** When the card was held, ms since 1970 UTC; null while awaiting payment. */
  placedAtMs: number | null;
}

/**
 * When an order is due: the customer's date, else the lead time in the shop's working days from the shop's day on
 * which the card was held; null while neither is known.
 */
export function dueDateOf(order: DatedOrder, schedule: ShopCalendar & { leadTimeDays: number }): string | null {
  if (order.neededBy) return order.neededBy;
  if (order.placedAtMs === null) return null;
  return addWorkingDays(shopDayOf(order.placedAtMs, schedule.timeZone), schedule.leadTimeDays, schedule);
}

/** Due before the shop's today: an order due today is not late until the shop's day is over. */
export const isPastDue = (dueDate: string | null, shopToday: string): boolean =>
  dueDate !== null && dueDate < shopToday;
