import { describe, expect, it } from 'vitest';
import { calendarRange } from '../../../admin/src/features/orders/model/calendar-range.ts';
import { parseCents } from '../../../admin/src/lib/money-input.ts';
import { boardSearch } from '../../../admin/src/features/orders/api/get-order-board.ts';
import { orderBoardQuery } from '../../../server/src/contracts/studio-orders.ts';

describe('parseCents', () => {
  it.each([
    ['12', 1200],
    ['12.5', 1250],
    ['12.05', 1205],
    ['$ 7.99', 799],
    ['3,50', 350],
    [' 0.01 ', 1],
  ])('reads %j as %i cents', (text, cents) => {
    expect(parseCents(text)).toBe(cents);
  });

  it.each(['', 'five', '1.234', '-3', '12.', '1e3'])('refuses %j', (text) => {
    expect(parseCents(text)).toBeUndefined();
  });
});

describe('calendarRange', () => {
  it('starts on the Monday of this week and spans whole weeks', () => {
    // 2026-12-01 is a Tuesday (ISO 8601 weeks start on Monday).
    const range = calendarRange(Date.parse('2026-12-01T22:30:00Z'), 6, 'America/Chicago');
    expect(range.from).toBe('2026-11-30');
    expect(range.to).toBe('2027-01-10');
    expect(range.days).toHaveLength(42);
    expect(range.days).toContain('2026-12-31');
  });

  it('on a Sunday, still shows the week that ends that day', () => {
    expect(calendarRange(Date.parse('2026-12-06T08:00:00Z'), 1, 'America/Chicago')).toMatchObject({
      from: '2026-11-30',
      to: '2026-12-06',
    });
  });

  it('on Sunday evening in the shop, when it is already Monday in UTC, the shop’s week still shows', () => {
    // 20:00 on Sunday 6 December in Chicago is 02:00 UTC on Monday 7 December.
    expect(calendarRange(Date.parse('2026-12-07T02:00:00Z'), 1, 'America/Chicago')).toMatchObject({
      from: '2026-11-30',
      to: '2026-12-06',
    });
    expect(calendarRange(Date.parse('2026-12-07T02:00:00Z'), 1, 'UTC').from).toBe('2026-12-07');
  });
});

describe('boardSearch', () => {
  it('leaves the defaults out and round-trips through the contract', () => {
    expect(boardSearch(orderBoardQuery.parse({}))).toBe('');
    const query = orderBoardQuery.parse({
      status: 'authorized,proof_sent',
      q: 'castell',
      sort: 'due',
      dir: 'asc',
      page: '2',
    });
    const search = boardSearch(query);
    expect(search).toBe('status=authorized%2Cproof_sent&q=castell&sort=due&dir=asc&page=2');
    expect(orderBoardQuery.parse(Object.fromEntries(new URLSearchParams(search)))).toEqual(query);
  });
});
