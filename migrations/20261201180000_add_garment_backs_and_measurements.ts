import type { Knex } from 'knex';

/**
 * The catalogue shows each garment from the back as well as the front, and each size with the body measurements a
 * parent checks before ordering. The back drawing is optional (NULL until the studio adds one); it shares the front's
 * viewBox, so one size's mockup scale draws both. Chest and length are the garment's own (flat, doubled for chest),
 * in millimetres; NULL where a measurement does not apply (a bonnet has no chest).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('garments', (t) => {
    t.specificType('mockup_back_svg', 'MEDIUMTEXT').nullable();
  });
  await knex.schema.alterTable('garment_sizes', (t) => {
    t.decimal('chest_mm', 8, 2).nullable();
    t.decimal('length_mm', 8, 2).nullable();
  });
  await knex.raw(
    'ALTER TABLE garment_sizes ADD CONSTRAINT garment_sizes_measurements_positive CHECK ((`chest_mm` IS NULL OR `chest_mm` > 0) AND (`length_mm` IS NULL OR `length_mm` > 0))',
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('ALTER TABLE garment_sizes DROP CONSTRAINT garment_sizes_measurements_positive');
  await knex.schema.alterTable('garment_sizes', (t) => {
    t.dropColumn('length_mm');
    t.dropColumn('chest_mm');
  });
  await knex.schema.alterTable('garments', (t) => {
    t.dropColumn('mockup_back_svg');
  });
}
