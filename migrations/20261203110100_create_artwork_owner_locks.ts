import type { Knex } from 'knex';
import { caseSensitive, useTableDefaults } from './support/columns.ts';

/**
 * One row per owner of uploads (`user:<id>` or `session:<key>`), locked while an upload is counted against the
 * owner's cap and inserted, so parallel uploads from one visitor are counted one after another. A visitor has no
 * row of their own to lock before their session is first saved, hence this table.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('artwork_owner_locks', (t) => {
    useTableDefaults(t);
    t.string('owner_key', 80).collate(caseSensitive).primary();
    t.datetime('created_at').notNullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('artwork_owner_locks');
}
