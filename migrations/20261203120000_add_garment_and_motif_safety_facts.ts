import type { Knex } from 'knex';

/**
 * The facts the children's safety cautions are worked out from (issue 11 §1). On a garment: where it has ribbon
 * ties or drawstrings (hood, neck, waist; JSON arrays of places, empty when none), how it fastens and whether that
 * fastening goes round the neck, and whether it is made as day wear or sleepwear. On each size: the ages it is made
 * for, months, so a caution follows the size a parent chose. On a motif: the trims beyond stitches that it carries
 * (appliqué, buttons, bows, beads; a JSON array, empty for stitches only), which could come off.
 *
 * Existing rows keep what was assumed before: day wear, no cords, no trims, and each size the garment's whole range.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('garments', (t) => {
    t.json('tie_places').nullable();
    t.json('drawstring_places').nullable();
    t.enum('closure', ['none', 'snaps', 'buttons', 'hook_and_loop', 'ties', 'zip']).notNullable().defaultTo('none');
    t.boolean('closes_at_neck').notNullable().defaultTo(false);
    t.enum('intended_use', ['day_wear', 'sleepwear']).notNullable().defaultTo('day_wear');
  });
  await knex('garments').update({ tie_places: '[]', drawstring_places: '[]' });
  await knex.raw(
    "ALTER TABLE garments MODIFY tie_places JSON NOT NULL DEFAULT '[]', MODIFY drawstring_places JSON NOT NULL DEFAULT '[]'",
  );

  await knex.schema.alterTable('garment_sizes', (t) => {
    t.smallint('min_age_months').unsigned().nullable();
    t.smallint('max_age_months').unsigned().nullable();
  });
  await knex.raw(
    'UPDATE garment_sizes s JOIN garments g ON g.id = s.garment_id ' +
      'SET s.min_age_months = g.min_age_months, s.max_age_months = g.max_age_months',
  );
  await knex.raw(
    'ALTER TABLE garment_sizes MODIFY min_age_months SMALLINT UNSIGNED NOT NULL, ' +
      'MODIFY max_age_months SMALLINT UNSIGNED NOT NULL, ' +
      'ADD CONSTRAINT garment_sizes_age_range CHECK (`min_age_months` <= `max_age_months`)',
  );

  await knex.schema.alterTable('motifs', (t) => {
    t.json('trims').nullable();
  });
  await knex('motifs').update({ trims: '[]' });
  await knex.raw("ALTER TABLE motifs MODIFY trims JSON NOT NULL DEFAULT '[]'");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('motifs', (t) => {
    t.dropColumn('trims');
  });
  await knex.raw('ALTER TABLE garment_sizes DROP CONSTRAINT garment_sizes_age_range');
  await knex.schema.alterTable('garment_sizes', (t) => {
    t.dropColumn('max_age_months');
    t.dropColumn('min_age_months');
  });
  await knex.schema.alterTable('garments', (t) => {
    t.dropColumn('intended_use');
    t.dropColumn('closes_at_neck');
    t.dropColumn('closure');
    t.dropColumn('drawstring_places');
    t.dropColumn('tie_places');
  });
}
