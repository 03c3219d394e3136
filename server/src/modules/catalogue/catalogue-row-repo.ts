import type { Db } from '../../db/knex.ts';

/** The catalogue tables the studio edits row by row. */
export type CatalogueTable =
  'garments' | 'garment_sizes' | 'fabric_colours' | 'motifs' | 'lettering_fonts' | 'threads' | 'hoops';

/** What became of a write; `duplicate` is a unique key already taken, `in-use` a row other records still point at. */
export type RowWrite = { outcome: 'written'; id: number } | { outcome: 'missing' | 'duplicate' | 'in-use' };

type Row = Record<string, unknown>;

// MariaDB error numbers: ER_DUP_ENTRY, ER_ROW_IS_REFERENCED_2.
const DUPLICATE_KEY = 1062;
const REFERENCED_ROW = 1451;

function errnoOf(error: unknown): number | undefined {
  return (error as { errno?: number })?.errno;
}

export async function insertCatalogueRow(db: Db, table: CatalogueTable, row: Row): Promise<RowWrite> {
  try {
    const [id] = await db(table).insert(row);
    return { outcome: 'written', id: id! };
  } catch (error) {
    if (errnoOf(error) === DUPLICATE_KEY) return { outcome: 'duplicate' };
    throw error;
  }
}

/** Updates the one row matching `where` (its id plus, for sizes and colours, the garment it belongs to). */
export async function updateCatalogueRow(
  db: Db,
  table: CatalogueTable,
  where: Row & { id: number },
  row: Row,
): Promise<RowWrite> {
  return db.transaction(async (trx) => {
    if (!(await trx(table).where(where).forUpdate().first('id'))) return { outcome: 'missing' };
    try {
      await trx(table).where(where).update(row);
    } catch (error) {
      if (errnoOf(error) === DUPLICATE_KEY) return { outcome: 'duplicate' };
      throw error;
    }
    return { outcome: 'written', id: where.id };
  });
}

/** Deletes the row unless a foreign key still holds it (designs and orders keep their garment, size and colour). */
export async function deleteCatalogueRow(
  db: Db,
  table: CatalogueTable,
  where: Row & { id: number },
): Promise<RowWrite> {
  try {
    const deleted = await db(table).where(where).delete();
    return deleted === 0 ? { outcome: 'missing' } : { outcome: 'written', id: where.id };
  } catch (error) {
    if (errnoOf(error) === REFERENCED_ROW) return { outcome: 'in-use' };
    throw error;
  }
}

/** Whether the row is offered to customers; a row without the flag (a size, a colour) always is. */
export async function readRowIsActive(db: Db, table: CatalogueTable, id: number): Promise<boolean> {
  const row = await db(table).where({ id }).first('is_active');
  return Boolean(row?.is_active ?? true);
}
