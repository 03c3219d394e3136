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
const customerDay = new Intl.DateTimeFormat('en-US', { month: 'long', day: 'numeric', year: 'numeric' });
const customerCalendarDay = new Intl.DateTimeFormat('en-US', {
  month: 'long',
  day: 'numeric',
  year: 'numeric',
  timeZone: 'UTC',
});

/**
 * The one date style customers see on the storefront, e.g. "December 18, 2026". A calendar date
 * ("2026-12-18": a due or needed-by date) is that day wherever the reader is; a moment (an ISO timestamp) is the
 * day it was where the reader is.
 */
export function formatCustomerDate(value: string): string {
  return CALENDAR_DATE.test(value)
    ? customerCalendarDay.format(new Date(`${value}T12:00:00Z`))
    : customerDay.format(new Date(value));
}

const customerTime = new Intl.DateTimeFormat('en-US', { hour: 'numeric', minute: '2-digit' });

/** A moment for customers, in the same date style with the time: "December 3, 2026, 3:05 PM". */
export const formatCustomerDateTime = (iso: string): string =>
  `${formatCustomerDate(iso)}, ${customerTime.format(new Date(iso))}`;
