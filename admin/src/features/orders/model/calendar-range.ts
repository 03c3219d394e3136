const DAY_MS = 86_400_000;
const isoDay = (ms: number) => new Date(ms).toISOString().slice(0, 10);

/**
 * The calendar's days: from the Monday of the week holding `nowMs` for `weeks` whole weeks, as YYYY-MM-DD in UTC
 * (as due dates are stored), with the first and last day for the request.
 */
export function calendarRange(nowMs: number, weeks: number): { from: string; to: string; days: string[] } {
  const today = Date.parse(isoDay(nowMs));
  const monday = today - ((new Date(today).getUTCDay() + 6) % 7) * DAY_MS;
  const days = Array.from({ length: weeks * 7 }, (_, i) => isoDay(monday + i * DAY_MS));
  return { from: days[0]!, to: days.at(-1)!, days };
}
