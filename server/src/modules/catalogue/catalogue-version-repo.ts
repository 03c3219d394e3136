import type { Db } from '../../db/knex.ts';

/** The count the database's triggers raise on every catalogue, price list and shop settings write. */
export async function readCatalogueVersion(db: Db): Promise<number> {
  const [rows] = await db.raw('SELECT version FROM catalogue_versions WHERE id = 1');
  const row = (rows as { version: number | string }[])[0];
  return row ? Number(row.version) : 0;
}
