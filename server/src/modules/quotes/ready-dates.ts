/**
 * When an order can be ready, counted in the shop's working days (Monday to Friday) from today in the shop's own
 * time zone. Dates are calendar days, YYYY-MM-DD, worked on as UTC midnights so no daylight-saving shift moves them.
 */
import type { ReadyDates } from '../../contracts/stored-quotes.ts';

const dayMs = 86_400_000;

/** Today's date where the shop is, YYYY-MM-DD. */
export function shopToday(now: Date, timeZone: string): string {
  // en-CA formats as YYYY-MM-DD.
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(now);
}

/** The working day `days` working days after `date` (Saturday + 1 is Monday); with 0, a weekend day moves on to Monday. */
export function addWorkingDays(date: string, days: number): string {
  let at = Date.parse(`${date}T00:00:00Z`);
  let left = days;
  const isWeekend = (ms: number) => [0, 6].includes(new Date(ms).getUTCDay());
  while (left > 0 || isWeekend(at)) {
    at += dayMs;
    if (!isWeekend(at)) left -= 1;
  }
  return new Date(at).toISOString().slice(0, 10);
}

/**
 * The earliest ready dates for an order placed today. A rush order jumps the queue, so it takes half the lead
 * time, rounded up (common practice, no source).
 */
export function workOutReadyDates(today: string, leadTimeDays: number): ReadyDates {
  return {
    leadTimeDays,
    earliestReadyDate: addWorkingDays(today, leadTimeDays),
    earliestRushDate: addWorkingDays(today, Math.ceil(leadTimeDays / 2)),
  };
}
