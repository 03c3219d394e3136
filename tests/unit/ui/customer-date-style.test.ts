import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { formatCustomerDate, formatCustomerDateTime } from '../../../ui/src/format.ts';
import { sourcesUnder } from './support/sources-under.ts';

describe('formatCustomerDate', () => {
  it('when a calendar date is shown to a customer, then it reads month, day and year, the same day in every time zone', () => {
    expect(formatCustomerDate('2026-12-18')).toBe('December 18, 2026');
    expect(formatCustomerDate('2027-01-01')).toBe('January 1, 2027');
  });

  it('when a moment is shown, then it reads in the same style, with the time after it for the timeline', () => {
    // Noon UTC is the same calendar day in every zone from UTC−11 to UTC+11.
    expect(formatCustomerDate('2026-12-03T12:00:00.000Z')).toBe('December 3, 2026');
    expect(formatCustomerDateTime('2026-12-03T12:00:00.000Z')).toMatch(/^December 3, 2026, \d{1,2}:\d{2} (AM|PM)$/);
  });
});

describe('one date style on the storefront', () => {
  it('when a storefront page shows a date, then it goes through formatCustomerDate, never its own format', () => {
    const root = new URL('../../../storefront/src/', import.meta.url).pathname;
    const ownFormats = sourcesUnder(root).filter((file) =>
      /toLocaleDateString\('en-US'|toLocaleString\('en-US', \{ date|DateTimeFormat\(/.test(readFileSync(file, 'utf8')),
    );
    // The payment panel's hold date is the payments work's file; it moves to formatCustomerDate at the merge.
    expect(ownFormats.map((file) => file.slice(root.length))).toEqual(['features/orders/components/payment-state.tsx']);
  });
});
