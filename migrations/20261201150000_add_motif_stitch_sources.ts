import type { Knex } from 'knex';

/**
 * A motif's stitch figures can come from two places: the engine's estimate from its artwork, or the count the
 * studio measured in its digitizing program. The figures quotes use stay in stitch_count and the mix columns;
 * this records which source they are and keeps the engine's estimate beside them, so the studio can compare.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('motifs', (t) => {
    // Seeded and earlier motifs were entered from their digitized files.
    t.enum('stitch_count_source', ['measured', 'estimate']).notNullable().defaultTo('measured');
    // The engine's estimate at 100 %, underlay folded into satin and fill; NULL where it was never run.
    t.integer('estimated_run_stitches').unsigned().nullable();
    t.integer('estimated_satin_stitches').unsigned().nullable();
    t.integer('estimated_fill_stitches').unsigned().nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('motifs', (t) => {
    t.dropColumn('stitch_count_source');
    t.dropColumn('estimated_run_stitches');
    t.dropColumn('estimated_satin_stitches');
    t.dropColumn('estimated_fill_stitches');
  });
}
