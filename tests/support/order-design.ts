import type { Db } from '../../server/src/db/knex.ts';
import type { DesignDocument } from '../../server/src/contracts/designs.ts';

/** The saved design an order stitches (its first line's), read straight from the database. */
export async function orderDesignOf(db: Db, number: string): Promise<{ id: number; document: DesignDocument }> {
  const row = await db('order_items as i')
    .join('orders as o', 'o.id', 'i.order_id')
    .join('designs as d', 'd.id', 'i.design_id')
    .where('o.number', number)
    .first('d.id', 'd.document');
  return { id: row.id, document: typeof row.document === 'string' ? JSON.parse(row.document) : row.document };
}
