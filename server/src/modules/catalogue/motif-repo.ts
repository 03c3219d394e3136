import type { Db } from '../../db/knex.ts';
import { z } from 'zod';
import type { MotifSummary } from '../../contracts/catalogue.ts';
import { motifTrims } from '../../contracts/guidance.ts';
import { jsonColumn } from '../../db/json-column.ts';

const motifTrimList = z.array(z.enum(motifTrims));

/** A motifs row as the catalogue shows it; the studio's catalogue adds its measured figures on top. */
export function toMotifSummary(row: Record<string, any>): MotifSummary {
  return {
    id: row.id,
    slug: row.slug,
    name: row.name,
    kind: row.kind,
    svg: row.svg,
    // mysql2 returns DECIMAL columns as strings.
    widthMm: Number(row.width_mm),
    heightMm: Number(row.height_mm),
    gapMm: Number(row.gap_mm),
    minScalePct: row.min_scale_pct,
    maxScalePct: row.max_scale_pct,
    colourCount: row.colour_count,
    stitchCount: row.stitch_count,
    // JSON columns arrive parsed.
    threadCodes: row.default_thread_codes,
    trims: motifTrimList.parse(jsonColumn(row.trims)),
  };
}

/** Active motifs, borders first, in the shop's display order. */
export async function listActiveMotifs(db: Db): Promise<MotifSummary[]> {
  const rows = await db('motifs')
    .select(
      'id',
      'slug',
      'name',
      'kind',
      'svg',
      'width_mm',
      'height_mm',
      'gap_mm',
      'min_scale_pct',
      'max_scale_pct',
      'colour_count',
      'stitch_count',
      'default_thread_codes',
      'trims',
    )
    .where({ is_active: true })
    .orderBy([{ column: 'kind' }, { column: 'sort_order' }, { column: 'id' }]);
  return rows.map(toMotifSummary);
}
