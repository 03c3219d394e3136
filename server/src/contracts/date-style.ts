const CALENDAR_DATE = /^\d{4}-\d{2}-\d{2}$/;
const clock = new Intl.DateTimeFormat('en-US', { hour: 'numeric', minute: '2-digit' });

/**
 * One audience's date style, shared by the screens (`ui/src/format.ts`) and the e-mails (`mail/day-text.ts`): a
 * calendar date ("2026-12-18": a due or needed-by date) is that day wherever the reader is; a moment (an ISO
 * timestamp) is the day it was where the formatting runs; `withTime` adds the clock.
 */
function dateStyle(options: Intl.DateTimeFormatOptions) {
  const moment = new Intl.DateTimeFormat('en-US', options);
  const calendarDay = new Intl.DateTimeFormat('en-US', { ...options, timeZone: 'UTC' });
  const date = (value: string) =>
    CALENDAR_DATE.test(value) ? calendarDay.format(new Date(`${value}T12:00:00Z`)) : moment.format(new Date(value));
  return { date, withTime: (iso: string) => `${date(iso)}, ${clock.format(new Date(iso))}` };
}

/** Customers' style: "December 18, 2026". */
export const customerDateStyle = dateStyle({ month: 'long', day: 'numeric', year: 'numeric' });
/** The studio's style, weekday first as the studio plans by it: "Fri, Dec 18, 2026". */
export const studioDateStyle = dateStyle({ weekday: 'short', month: 'short', day: 'numeric', year: 'numeric' });
