import type { Knex } from 'knex';
import { DEFAULT_STITCH_SETTINGS, measureSvgArtwork } from '../server/src/engine/index.ts';

/**
 * An SVG upload is measured for stitching once, when it is uploaded, and quotes count stitches from what was
 * measured instead of parsing the drawing again each time: `stitch_figures` holds the engine's measurements
 * (`SvgArtworkFigures`, JSON). Uploads already stored are measured here; a raster has none.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('artwork_uploads', (t) => {
    t.text('stitch_figures', 'longtext').nullable();
  });
  const rows: { id: number; sanitized_svg: string }[] = await knex('artwork_uploads')
    .select('id', 'sanitized_svg')
    .whereNotNull('sanitized_svg');
  for (const row of rows) {
    const measured = measureSvgArtwork(row.sanitized_svg, DEFAULT_STITCH_SETTINGS);
    if (measured.ok)
      await knex('artwork_uploads')
        .where({ id: row.id })
        .update({ stitch_figures: JSON.stringify(measured.figures) });
  }
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('artwork_uploads', (t) => {
    t.dropColumn('stitch_figures');
  });
}
