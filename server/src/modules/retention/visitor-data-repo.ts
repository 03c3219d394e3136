import type { Db } from '../../db/knex.ts';

/** How many rows one sweep removed, by kind. */
export interface VisitorDataSwept {
  sessions: number;
  uploads: number;
  quotes: number;
}

/**
 * Deletes what visitors left that no account claimed, older than `cutoff`: uploads still keyed to a session, quotes
 * with no customer (and no order, which a visitor's quote never has), and sessions nobody is signed in to whose
 * last use (their expiry less the session lifetime) is before the cutoff or that have expired.
 */
export async function deleteUnclaimedVisitorData(
  db: Db,
  cutoff: Date,
  now: Date,
  sessionLifetimeMs: number,
): Promise<VisitorDataSwept> {
  const uploads = await db('artwork_uploads').whereNull('owner_user_id').where('created_at', '<', cutoff).delete();
  const quotes = await db('quotes')
    .whereNull('customer_id')
    .where('created_at', '<', cutoff)
    .whereNotExists(db('orders').select(db.raw('1')).whereRaw('orders.quote_id = quotes.id'))
    .delete();
  const nowSeconds = Math.floor(now.getTime() / 1000);
  const lastUseCutoffSeconds = Math.floor((cutoff.getTime() + sessionLifetimeMs) / 1000);
  const sessions = await db('sessions')
    .whereRaw("JSON_VALUE(`data`, '$.passport.user') IS NULL")
    .where((q) => q.where('expires', '<', nowSeconds).orWhere('expires', '<', lastUseCutoffSeconds))
    .delete();
  return { sessions, uploads, quotes };
}
