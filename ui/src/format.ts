import { toInchFraction } from '@server/engine/inch-fraction.ts';

/** Formats integer minor units with the currency's own decimals (USD 1234 → $12.34, JPY 500 → ¥500). */
export function formatMoney(cents: number, currency: string, locale = 'en-US'): string {
  const formatter = new Intl.NumberFormat(locale, { style: 'currency', currency });
  const digits = formatter.resolvedOptions().maximumFractionDigits ?? 2;
  return formatter.format(cents / 10 ** digits);
}

/** A length for people: millimetres and the nearest sixteenth of an inch, e.g. "173 mm · 6 ¹³⁄₁₆ in". */
export function formatLength(mm: number): string {
  const { whole, numerator: num, denominator: den } = toInchFraction(mm);
  const sup = '⁰¹²³⁴⁵⁶⁷⁸⁹';
  const sub = '₀₁₂₃₄₅₆₇₈₉';
  const map = (n: number, digits: string) => String(n).replace(/\d/g, (d) => digits[Number(d)]!);
  const fraction = num === 0 ? '' : `${whole ? ' ' : ''}${map(num, sup)}⁄${map(den, sub)}`;
  return `${Math.round(mm)} mm · ${whole || !fraction ? whole : ''}${fraction} in`;
}

const CALENDAR_DATE = /^\d{4}-\d{2}-\d{2}$/;
const clock = new Intl.DateTimeFormat('en-US', { hour: 'numeric', minute: '2-digit' });

/**
 * One audience's date style: a calendar date ("2026-12-18": a due or needed-by date) is that day wherever the
 * reader is; a moment (an ISO timestamp) is the day it was where the reader is; `withTime` adds the clock.
 */
function dateStyle(options: Intl.DateTimeFormatOptions) {
  const moment = new Intl.DateTimeFormat('en-US', options);
  const calendarDay = new Intl.DateTimeFormat('en-US', { ...options, timeZone: 'UTC' });
  const date = (value: string) =>
    CALENDAR_DATE.test(value) ? calendarDay.format(new Date(`${value}T12:00:00Z`)) : moment.format(new Date(value));
  return { date, withTime: (iso: string) => `${date(iso)}, ${clock.format(new Date(iso))}` };
}

const customerStyle = dateStyle({ month: 'long', day: 'numeric', year: 'numeric' });
const studioStyle = dateStyle({ weekday: 'short', month: 'short', day: 'numeric', year: 'numeric' });

/** The one date style customers see, on the storefront: "December 18, 2026". */
export const formatCustomerDate = customerStyle.date;
/** A moment for customers, in the same style with the time: "December 3, 2026, 3:05 PM". */
export const formatCustomerDateTime = customerStyle.withTime;
/** The one date style of the studio app, weekday first as the studio plans by it: "Fri, Dec 18, 2026". */
export const formatStudioDate = studioStyle.date;
/** A moment for the studio, in the same style with the time: "Thu, Dec 3, 2026, 3:05 PM". */
export const formatStudioDateTime = studioStyle.withTime;
