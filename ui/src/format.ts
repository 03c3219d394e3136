import { customerDateStyle, studioDateStyle } from '@server/contracts/date-style.ts';
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

/** The one date style customers see, on the storefront: "December 18, 2026". */
export const formatCustomerDate = customerDateStyle.date;
/** A moment for customers, in the same style with the time: "December 3, 2026, 3:05 PM". */
export const formatCustomerDateTime = customerDateStyle.withTime;
/** The one date style of the studio app, weekday first as the studio plans by it: "Fri, Dec 18, 2026". */
export const formatStudioDate = studioDateStyle.date;
/** A moment for the studio, in the same style with the time: "Thu, Dec 3, 2026, 3:05 PM". */
export const formatStudioDateTime = studioDateStyle.withTime;
