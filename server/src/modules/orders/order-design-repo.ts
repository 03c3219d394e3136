import type { Db } from '../../db/knex.ts';

/**
 * The design of an order's first line (an order is one design on identical garments) with its garment, size and
 * customer, as stored; undefined when there is no such order.
 */
export async function readOrderDesign(
  db: Db,
  number: string,
): Promise<{ customerId: number; garmentId: number; sizeId: number; document: unknown } | undefined> {
  const row = await db('orders as o')
    .join('order_items as i', 'i.order_id', 'o.id')
    .join('designs as d', 'd.id', 'i.design_id')
    .select('o.customer_id', 'd.garment_id', 'd.garment_size_id', 'd.document')
    .where('o.number', number)
    .orderBy('i.id')
    .first();
  return row
    ? { customerId: row.customer_id, garmentId: row.garment_id, sizeId: row.garment_size_id, document: row.document }
    : undefined;
}
