import type { Db } from '../../db/knex.ts';

/** One trivial query, given up after `timeoutMs`: can this server reach its database right now? */
export async function pingDatabase(db: Db, timeoutMs: number): Promise<boolean> {
  let timer: NodeJS.Timeout | undefined;
  const gaveUp = new Promise<false>((resolve) => {
    timer = setTimeout(() => resolve(false), timeoutMs);
  });
  try {
    return await Promise.race([db.raw('SELECT 1').then(() => true as const), gaveUp]);
  } catch {
    return false;
  } finally {
    clearTimeout(timer);
  }
}
