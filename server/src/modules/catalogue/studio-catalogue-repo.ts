import type { Db } from '../../db/knex.ts';
import type { StudioCatalogueResponse } from '../../contracts/admin-catalogue.ts';
import { toMotifSummary } from './motif-repo.ts';
import { letteringFontColumns, toLetteringFont } from './lettering-font-repo.ts';

const ordered = [{ column: 'sort_order' }, { column: 'id' }];

/** Everything the studio stitches with, active or not: motifs with their measured figures, threads, hoops, fonts. */
export async function readStudioCatalogue(db: Db): Promise<StudioCatalogueResponse> {
  const [motifs, threads, hoops, fonts] = await Promise.all([
    db('motifs')
      .select('*')
      .orderBy([{ column: 'kind' }, ...ordered]),
    db('threads').select('id', 'code', 'name', 'hex', 'lab_l', 'lab_a', 'lab_b', 'is_active').orderBy(ordered),
    db('hoops')
      .select('id', 'slug', 'name', 'field_width_mm', 'field_height_mm', 'clearance_mm', 'is_active')
      .orderBy(ordered),
    db('lettering_fonts')
      .select([...letteringFontColumns, 'fontsource_package', 'is_active'])
      .orderBy(ordered),
  ]);
  // mysql2 returns DECIMAL columns as strings and booleans as 0/1; JSON columns arrive parsed.
  return {
    motifs: motifs.map((m) => ({
      ...toMotifSummary(m),
      stitchCount: m.stitch_count,
      mix: { run: m.run_stitches, satin: m.satin_stitches, fill: m.fill_stitches },
      isActive: Boolean(m.is_active),
      stitchCountSource: m.stitch_count_source,
      estimatedMix:
        m.estimated_run_stitches === null
          ? null
          : { run: m.estimated_run_stitches, satin: m.estimated_satin_stitches, fill: m.estimated_fill_stitches },
    })),
    threads: threads.map((t) => ({
      id: t.id,
      code: t.code,
      name: t.name,
      hex: t.hex,
      isActive: Boolean(t.is_active),
      lab: { l: Number(t.lab_l), a: Number(t.lab_a), b: Number(t.lab_b) },
    })),
    hoops: hoops.map((h) => ({
      id: h.id,
      slug: h.slug,
      name: h.name,
      fieldWidthMm: Number(h.field_width_mm),
      fieldHeightMm: Number(h.field_height_mm),
      clearanceMm: Number(h.clearance_mm),
      isActive: Boolean(h.is_active),
    })),
    fonts: fonts.map((f) => ({
      ...toLetteringFont(f),
      fontsourcePackage: f.fontsource_package,
      isActive: Boolean(f.is_active),
    })),
  };
}
