import type { Knex } from 'knex';

/**
 * Each hoop keeps a margin free inside its sewing field, so the presser foot never meets the frame and the fabric is
 * still taut under the last stitches; every hooping the shop plans (border repeats, single items, the sheet's
 * template) fits inside the field less this margin at each edge. 3 mm is the default: a few millimetres is common
 * practice (no source), and 3 mm still lets the 120 × 180 mm field hold one 173 mm border repeat (173 + 2 × 3 =
 * 179 mm), the trade's worked case.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('hoops', (t) => {
    t.decimal('clearance_mm', 5, 2).notNullable().defaultTo(3);
  });
  await knex.raw('ALTER TABLE hoops ADD CONSTRAINT hoops_clearance_not_negative CHECK (`clearance_mm` >= 0)');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('ALTER TABLE hoops DROP CONSTRAINT hoops_clearance_not_negative');
  await knex.schema.alterTable('hoops', (t) => {
    t.dropColumn('clearance_mm');
  });
}
