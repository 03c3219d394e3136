import type { Knex } from 'knex';
import type { Db } from '../../db/knex.ts';
import type { StitchFile } from '../../contracts/proof-versions.ts';

export interface StitchFileWrite {
  orderId: number;
  placementId: string;
  stitchCount: number;
  colourCount: number;
  fileName: string;
  enteredBy: number;
  at: Date;
}

/** Enters (or corrects) the figures of one placement's stitch file: one row per placement of an order. */
export async function saveStitchFile(trx: Knex.Transaction, file: StitchFileWrite): Promise<void> {
  await trx('placement_stitch_files')
    .insert({
      order_id: file.orderId,
      placement_id: file.placementId,
      stitch_count: file.stitchCount,
      colour_count: file.colourCount,
      file_name: file.fileName,
      entered_by: file.enteredBy,
      created_at: file.at,
      updated_at: file.at,
    })
    .onConflict(['order_id', 'placement_id'])
    .merge(['stitch_count', 'colour_count', 'file_name', 'entered_by', 'updated_at']);
}

/** Every stitch file entered for an order, with who entered it. */
export async function listStitchFiles(db: Db, orderId: number): Promise<StitchFile[]> {
  const rows = await db('placement_stitch_files as f')
    .join('users as u', 'u.id', 'f.entered_by')
    .where('f.order_id', orderId)
    .orderBy('f.id')
    .select('f.placement_id', 'f.stitch_count', 'f.colour_count', 'f.file_name', 'u.name', 'f.updated_at');
  return rows.map((row) => ({
    placementId: row.placement_id,
    stitchCount: row.stitch_count,
    colourCount: row.colour_count,
    fileName: row.file_name,
    enteredByName: row.name,
    updatedAt: new Date(row.updated_at).toISOString(),
  }));
}
