import type { Db } from '../../db/knex.ts';
import type { ThreadColourSummary } from '../../contracts/catalogue.ts';

/** The active thread palette in the shop's display order: what a customer may choose for each colour. */
export async function listActiveThreads(db: Db): Promise<ThreadColourSummary[]> {
  const rows = await db('threads')
    .select('code', 'name', 'hex')
    .where({ is_active: true })
    .orderBy([{ column: 'sort_order' }, { column: 'id' }]);
  return rows.map((row) => ({ code: row.code, name: row.name, hex: row.hex }));
}

/** Which of these thread codes the palette has, active or retired. */
export async function findThreadCodes(db: Db, codes: string[]): Promise<string[]> {
  return (await db('threads').select('code').whereIn('code', codes)).map((row) => row.code as string);
}
