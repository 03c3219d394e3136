import type { Db } from '../../db/knex.ts';
import type { HoopSummary } from '../../contracts/catalogue.ts';

/** The studio's active hoops in its display order; nothing single can be stitched larger than the biggest field. */
export async function listActiveHoops(db: Db): Promise<HoopSummary[]> {
  const rows = await db('hoops')
    .select('slug', 'name', 'field_width_mm', 'field_height_mm', 'clearance_mm')
    .where({ is_active: true })
    .orderBy([{ column: 'sort_order' }, { column: 'id' }]);
  // mysql2 returns DECIMAL columns as strings.
  return rows.map((row) => ({
    slug: row.slug,
    name: row.name,
    fieldWidthMm: Number(row.field_width_mm),
    fieldHeightMm: Number(row.field_height_mm),
    clearanceMm: Number(row.clearance_mm),
  }));
}
