import type { Knex } from 'knex';

/**
 * One row counts changes to what the shop offers and how it prices: the catalogue tables, the shop's settings and
 * the price lists. Servers keep that data in memory and compare this number (one cheap query) before using it, so
 * a studio edit reaches every server instance on the next request. Triggers bump the count in the same
 * transaction as the write, so no write path (the studio's screens, the seeds, a hand-run SQL fix) can forget it.
 */
const watchedTables = [
  'garments',
  'garment_sizes',
  'fabric_colours',
  'motifs',
  'lettering_fonts',
  'threads',
  'hoops',
  'shop_settings',
  'pricing_rule_sets',
] as const;
const events = ['insert', 'update', 'delete'] as const;

const triggerName = (table: string, event: string) => `${table}_after_${event}_count_version`;

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('catalogue_versions', (t) => {
    t.tinyint('id').unsigned().primary();
    t.bigInteger('version').unsigned().notNullable().defaultTo(1);
  });
  await knex('catalogue_versions').insert({ id: 1, version: 1 });
  for (const table of watchedTables) {
    for (const event of events) {
      // INSERT … ON DUPLICATE KEY brings the row back should anyone empty the table.
      await knex.raw(
        `CREATE TRIGGER \`${triggerName(table, event)}\` AFTER ${event.toUpperCase()} ON \`${table}\` FOR EACH ROW ` +
          'INSERT INTO catalogue_versions (id, version) VALUES (1, 1) ON DUPLICATE KEY UPDATE version = version + 1',
      );
    }
  }
}

export async function down(knex: Knex): Promise<void> {
  for (const table of watchedTables) {
    for (const event of events) await knex.raw(`DROP TRIGGER IF EXISTS \`${triggerName(table, event)}\``);
  }
  await knex.schema.dropTable('catalogue_versions');
}
