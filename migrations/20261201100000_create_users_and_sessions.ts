import type { Knex } from 'knex';
import { addTimestamps, caseSensitive, useTableDefaults } from './support/columns.ts';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('users', (t) => {
    useTableDefaults(t);
    t.increments('id');
    // Google's stable subject id; NULL for people the shop adds before they first sign in.
    t.string('google_sub', 255).collate(caseSensitive).nullable().unique();
    // 320 = the longest address RFC 5321 allows; the _ci collation makes the unique key case-insensitive.
    t.string('email', 320).notNullable().unique();
    t.string('name', 200).notNullable();
    t.enum('role', ['customer', 'staff', 'owner']).notNullable().defaultTo('customer');
    addTimestamps(knex, t);
    t.index(['role'], 'users_role_index');
  });

  // express-mysql-session's own layout, byte for byte: the store reads and writes these columns itself and keeps
  // its own expiry, so the table has no created_at/updated_at.
  await knex.schema.createTable('sessions', (t) => {
    t.engine('InnoDB');
    t.charset('utf8mb4');
    t.collate(caseSensitive);
    t.string('session_id', 128).collate(caseSensitive).primary();
    t.integer('expires').unsigned().notNullable();
    t.specificType('data', 'MEDIUMTEXT').collate(caseSensitive);
    t.index(['expires'], 'sessions_expires_index');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('sessions');
  await knex.schema.dropTable('users');
}
