import type { Db } from '../../db/knex.ts';

/** Deletes sessions past their expiry (express-mysql-session keeps `expires` in Unix seconds). */
export async function purgeExpiredSessions(db: Db, now: Date): Promise<number> {
  return db('sessions')
    .where('expires', '<', Math.floor(now.getTime() / 1000))
    .delete();
}
