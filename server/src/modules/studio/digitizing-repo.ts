import type { Db } from '../../db/knex.ts';
import { restoreDesign } from '../../contracts/designs.ts';

const parsed = (value: unknown) => (typeof value === 'string' ? JSON.parse(value) : value);

/**
 * Orders whose customer's pictures still wait to be digitized: paid for (or sent back for changes), with an
 * uploaded picture on the design the customer last saw that has no stitch file entered yet. Until it has, its
 * price is the minimum and the studio has to confirm it with the proof.
 */
export async function readOrdersWithPicturesToDigitize(db: Db): Promise<Set<number>> {
  const rows = await db('orders as o')
    .join('order_items as i', 'i.order_id', 'o.id')
    .join('designs as d', 'd.id', 'i.design_id')
    .whereIn('o.status', ['authorized', 'changes_requested'])
    .select(
      'o.id',
      'd.document',
      db
        .select('p.design_document')
        .from('proofs as p')
        .whereRaw('p.order_id = o.id')
        .whereNotNull('p.design_document')
        .orderBy('p.version', 'desc')
        .limit(1)
        .as('proof_document'),
    );
  if (rows.length === 0) return new Set();
  const files = await db('placement_stitch_files')
    .whereIn(
      'order_id',
      rows.map((row) => row.id),
    )
    .select('order_id', 'placement_id');
  const entered = new Set(files.map((file) => `${file.order_id}/${file.placement_id}`));
  const waiting = new Set<number>();
  for (const row of rows) {
    const design = restoreDesign(parsed(row.proof_document) ?? parsed(row.document));
    if (!design.success) continue;
    const pending = design.data.placements.some(
      (placement) => placement.kind === 'artwork' && !entered.has(`${row.id}/${placement.id}`),
    );
    if (pending) waiting.add(row.id);
  }
  return waiting;
}
