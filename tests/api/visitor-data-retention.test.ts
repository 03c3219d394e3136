import { describe, expect, it } from 'vitest';
import { fixedNow, useApiHarness } from '../support/api-harness.ts';
import { createVisitorDataRetention } from '../../server/src/modules/retention/visitor-data-retention.ts';

const harness = useApiHarness();

const daysAgo = (days: number) => new Date(fixedNow().getTime() - days * 86_400_000);
const epochSeconds = (date: Date) => Math.floor(date.getTime() / 1000);

async function upload(owner: { userId: number } | { sessionKey: string }, createdAt: Date): Promise<number> {
  const [id] = await harness.db('artwork_uploads').insert({
    owner_user_id: 'userId' in owner ? owner.userId : null,
    session_key: 'sessionKey' in owner ? owner.sessionKey : null,
    original_name: 'sun.svg',
    mime_type: 'image/svg+xml',
    byte_size: 60,
    sanitized_svg: '<svg xmlns="http://www.w3.org/2000/svg"/>',
    width_px: 10,
    height_px: 10,
    created_at: createdAt,
    updated_at: createdAt,
  });
  return id!;
}

/** A copy of a seeded quote, for a customer or for a visitor (customer null), made at `createdAt`. */
async function quote(customerId: number | null, createdAt: Date): Promise<number> {
  const { id: _id, input, lines, ...seeded } = await harness.db('quotes').first();
  const [id] = await harness.db('quotes').insert({
    ...seeded,
    input: JSON.stringify(input),
    lines: JSON.stringify(lines),
    design_id: null,
    customer_id: customerId,
    created_at: createdAt,
    updated_at: createdAt,
  });
  return id!;
}

async function session(id: string, expires: Date, userId?: number): Promise<void> {
  const data = { cookie: { path: '/' }, ...(userId ? { passport: { user: userId } } : { artworkSessionKey: id }) };
  await harness.db('sessions').insert({ session_id: id, expires: epochSeconds(expires), data: JSON.stringify(data) });
}

const exists = async (table: string, where: Record<string, unknown>) =>
  (await harness.db(table).where(where)).length > 0;

describe('visitor data retention', () => {
  it('when the sweep runs, then visitors’ unclaimed uploads, quotes and sessions past the retention period go, and everything else stays', async () => {
    const priya = (await harness.db('users').where({ email: 'priya@example.test' }).first()).id as number;
    const oldVisitorUpload = await upload({ sessionKey: 'visitor-old' }, daysAgo(31));
    const newVisitorUpload = await upload({ sessionKey: 'visitor-new' }, daysAgo(29));
    const oldClaimedUpload = await upload({ userId: priya }, daysAgo(120));
    const oldVisitorQuote = await quote(null, daysAgo(31));
    const newVisitorQuote = await quote(null, daysAgo(2));
    const oldCustomerQuote = await quote(priya, daysAgo(120));
    await session('visitor-lapsed', daysAgo(1));
    await session('visitor-active', new Date(fixedNow().getTime() + 13 * 86_400_000));
    await session('customer-lapsed', daysAgo(1), priya);

    const lines: string[] = [];
    const retention = createVisitorDataRetention({
      db: harness.db,
      now: fixedNow,
      retentionDays: harness.config.visitorDataRetentionDays,
      log: (line) => lines.push(line),
    });
    await retention.start();
    retention.stop();

    expect(harness.config.visitorDataRetentionDays).toBe(30);
    expect(await exists('artwork_uploads', { id: oldVisitorUpload })).toBe(false);
    expect(await exists('artwork_uploads', { id: newVisitorUpload })).toBe(true);
    expect(await exists('artwork_uploads', { id: oldClaimedUpload })).toBe(true);
    expect(await exists('quotes', { id: oldVisitorQuote })).toBe(false);
    expect(await exists('quotes', { id: newVisitorQuote })).toBe(true);
    expect(await exists('quotes', { id: oldCustomerQuote })).toBe(true);
    expect(await exists('sessions', { session_id: 'visitor-lapsed' })).toBe(false);
    expect(await exists('sessions', { session_id: 'visitor-active' })).toBe(true);
    expect(await exists('sessions', { session_id: 'customer-lapsed' })).toBe(true);
    expect(lines).toEqual([
      expect.stringMatching(/^Visitor data older than 30 days removed: \d+ sessions, \d+ uploads, \d+ quotes\.$/),
    ]);
  });

  it('when the sweep runs again, then it finds nothing more to remove', async () => {
    const retention = createVisitorDataRetention({ db: harness.db, now: fixedNow, retentionDays: 30, log: () => {} });
    expect(await retention.sweep()).toEqual({ sessions: 0, uploads: 0, quotes: 0 });
  });
});
