import type { Knex } from 'knex';

/**
 * The days the shop is shut, which every working-day count steps over (issue 11 §5): days of the week (0 Sunday to
 * 6 Saturday, a JSON array; the weekend until the studio says otherwise) and single days such as holidays
 * (YYYY-MM-DD, a JSON array). The shop's day itself is its `timezone`, which the studio can now change too.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('shop_settings', (t) => {
    t.json('closed_weekdays').nullable();
    t.json('holidays').nullable();
  });
  await knex('shop_settings').update({ closed_weekdays: '[0,6]', holidays: '[]' });
  await knex.raw(
    "ALTER TABLE shop_settings MODIFY closed_weekdays JSON NOT NULL DEFAULT '[0,6]', MODIFY holidays JSON NOT NULL DEFAULT '[]'",
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('shop_settings', (t) => {
    t.dropColumn('holidays');
    t.dropColumn('closed_weekdays');
  });
}
