import type { Db } from '../../db/knex.ts';

/**
 * The studio's stitch-file names per placement of an order, entered after digitizing (`placement_stitch_files`,
 * written by the orders module's stitch-file step). Read only here.
 */
export async function readStitchFileNames(db: Db, orderId: number): Promise<Map<string, string>> {
  const rows = await db('placement_stitch_files')
    .select('placement_id', 'file_name')
    .where({ order_id: orderId })
    .whereNotNull('file_name');
  return new Map(rows.map((row) => [String(row.placement_id), String(row.file_name)]));
}
