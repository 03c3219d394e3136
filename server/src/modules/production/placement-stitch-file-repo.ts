import type { Db } from '../../db/knex.ts';

/**
 * The studio's stitch-file names per placement of an order, entered after digitizing (the proofs work stores them
 * in `placement_stitch_files`). Read only here; where that table is not there yet, every name is simply unknown.
 */
export async function readStitchFileNames(db: Db, orderId: number): Promise<Map<string, string>> {
  if (!(await db.schema.hasTable('placement_stitch_files'))) return new Map();
  const rows = await db('placement_stitch_files')
    .select('placement_id', 'file_name')
    .where({ order_id: orderId })
    .whereNotNull('file_name');
  return new Map(rows.map((row) => [String(row.placement_id), String(row.file_name)]));
}
