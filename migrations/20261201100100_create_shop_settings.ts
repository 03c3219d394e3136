import type { Knex } from 'knex';
import { addCurrency, addTimestamps, useTableDefaults } from './support/columns.ts';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('shop_settings', (t) => {
    useTableDefaults(t);
    // One shop per installation: the single row always has id 1.
    t.tinyint('id').unsigned().primary();
    t.check('`id` = 1', [], 'shop_settings_single_row');
    t.string('name', 200).notNullable();
    t.string('contact_email', 320).notNullable();
    addCurrency(t, 'shop_settings');
    t.specificType('country_code', 'CHAR(2)').notNullable();
    t.string('timezone', 64).notNullable();
    // The run-time figures the engine turns into machine minutes (issue 3 §4).
    t.smallint('machine_stitches_per_minute').unsigned().notNullable();
    t.decimal('minutes_per_colour_change', 6, 2).notNullable();
    t.decimal('minutes_per_hooping', 6, 2).notNullable();
    t.decimal('setup_minutes', 6, 2).notNullable();
    addTimestamps(knex, t);
    t.check('`machine_stitches_per_minute` > 0', [], 'shop_settings_speed_positive');
    t.check(
      '`minutes_per_colour_change` >= 0 AND `minutes_per_hooping` >= 0 AND `setup_minutes` >= 0',
      [],
      'shop_settings_minutes_non_negative',
    );
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('shop_settings');
}
