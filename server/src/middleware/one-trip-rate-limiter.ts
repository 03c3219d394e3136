import { RateLimiterMySQL } from 'rate-limiter-flexible';
import type { Db } from '../db/knex.ts';

/** The row shape rate-limiter-flexible's MySQL store reads back after counting. */
interface CounterRow {
  points: number;
  expire: number | null;
}

/** The parts of the package's MySQL store this subclass uses (they are not in its type declarations). */
interface StoreInternals {
  client: Db;
  dbName: string;
  tableName: string;
  points: number;
}

/** Requests for one key waiting for the statement after the one in flight. */
interface Batch {
  points: number;
  msDuration: number;
  waiters: { offset: number; resolve: (rows: CounterRow[]) => void; reject: (error: unknown) => void }[];
}

/**
 * rate-limiter-flexible's MySQL store, counting in one statement and once per burst. The package's own store counts
 * each request in a transaction of four round trips (BEGIN, upsert, SELECT, COMMIT) holding the counter's row lock
 * between them, so every price check from one address queued behind the last. Here:
 * - the upsert hands the new count back through `LAST_INSERT_ID(expr)` (the MySQL/MariaDB idiom for a counter read
 *   in the same statement: the OK packet carries it as the insert id), one round trip, the lock held only inside
 *   the statement;
 * - requests for a key that arrive while its statement runs are counted together by the next statement, each told
 *   the count up to its own request, so the total stays exact and a flood from one address costs one statement per
 *   round trip instead of one per request.
 * The expiry is read only for a client over its limit, where the refusal needs it for Retry-After.
 */
export class OneTripRateLimiter extends RateLimiterMySQL {
  private readonly inFlight = new Set<string>();
  private readonly batches = new Map<string, Batch>();

  _upsert(key: string, points: number, msDuration: number, forceExpire = false): Promise<CounterRow[]> {
    if (forceExpire) return this.count(key, points, msDuration, true);
    return new Promise((resolve, reject) => {
      const batch = this.batches.get(key) ?? { points: 0, msDuration, waiters: [] };
      batch.points += points;
      batch.waiters.push({ offset: batch.points, resolve, reject });
      this.batches.set(key, batch);
      if (!this.inFlight.has(key)) this.flush(key);
    });
  }

  private flush(key: string): void {
    const batch = this.batches.get(key);
    if (!batch) return;
    this.batches.delete(key);
    this.inFlight.add(key);
    this.count(key, batch.points, batch.msDuration, false)
      .then(
        ([row]) => {
          for (const waiter of batch.waiters)
            waiter.resolve([{ points: row.points - batch.points + waiter.offset, expire: row.expire }]);
        },
        (error: unknown) => batch.waiters.forEach((waiter) => waiter.reject(error)),
      )
      .finally(() => {
        this.inFlight.delete(key);
        this.flush(key);
      });
  }

  private async count(key: string, points: number, msDuration: number, forceExpire: boolean): Promise<CounterRow[]> {
    const store = this as unknown as StoreInternals;
    const now = Date.now();
    const newExpire = msDuration > 0 ? now + msDuration : null;
    const table = `${store.dbName}.${store.tableName}`;
    const counted = forceExpire
      ? 'points = LAST_INSERT_ID(?), expire = ?'
      : 'points = LAST_INSERT_ID(IF(expire <= ?, ?, points + ?)), expire = IF(expire <= ?, ?, expire)';
    const bindings = forceExpire ? [points, newExpire] : [now, points, points, now, newExpire];
    const [header] = (await store.client.raw(
      `INSERT INTO ?? (\`key\`, points, expire) VALUES (?, LAST_INSERT_ID(?), ?) ON DUPLICATE KEY UPDATE ${counted}`,
      [table, key, points, newExpire, ...bindings],
    )) as [{ insertId: number }];
    const total = Number(header.insertId);
    // Under the limit nobody needs the window's end; anyone over it is refused with the wait that is left.
    if (total <= store.points) return [{ points: total, expire: newExpire }];
    const [rows] = (await store.client.raw('SELECT expire FROM ?? WHERE `key` = ?', [table, key])) as [
      { expire: number | string | null }[],
    ];
    const expire = rows[0]?.expire;
    return [{ points: total, expire: expire === null || expire === undefined ? newExpire : Number(expire) }];
  }
}
