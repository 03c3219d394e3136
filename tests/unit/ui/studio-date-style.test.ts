import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { formatStudioDate, formatStudioDateTime } from '../../../ui/src/format.ts';
import { sourcesUnder } from './support/sources-under.ts';

describe('formatStudioDate', () => {
  it('when the studio sees a calendar date, then it reads weekday, month, day and year, the same day in every zone', () => {
    // 18 December 2026 is a Friday (1 December 2026 is a Tuesday, as the shop calendar's tests check).
    expect(formatStudioDate('2026-12-18')).toBe('Fri, Dec 18, 2026');
  });

  it('when the studio sees a moment, then it reads in the same style with the time', () => {
    expect(formatStudioDate('2026-12-03T12:00:00.000Z')).toBe('Thu, Dec 3, 2026');
    expect(formatStudioDateTime('2026-12-03T12:00:00.000Z')).toMatch(/^Thu, Dec 3, 2026, \d{1,2}:\d{2} (AM|PM)$/);
  });
});

describe('one date style in the studio app', () => {
  it('when a studio page shows a day or a moment, then it goes through formatStudioDate, not its own format', () => {
    const root = new URL('../../../admin/src/', import.meta.url).pathname;
    const ownFormats = sourcesUnder(root).filter((file) =>
      /toLocaleDateString\(|DateTimeFormat\(/.test(readFileSync(file, 'utf8')),
    );
    // Left: chart and calendar labels (a week's "Dec 7", a month's name), which name a period rather than a date.
    expect(ownFormats.map((file) => file.slice(root.length)).sort()).toEqual(
      [
        'app/routes/today.tsx',
        'features/orders/components/due-calendar.tsx',
        'features/overview/components/week-label.ts',
      ].sort(),
    );
  });
});
