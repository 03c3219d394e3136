/**
 * Column helpers shared by the migrations. A migration is never edited once merged, and it runs this file as it is
 * today, so these helpers are frozen too: to change a convention, add a new helper and use it in new migrations.
 */
import type { Knex } from 'knex';

/** InnoDB for foreign keys and transactions; utf8mb4 so names and notes can hold any character. */
export function useTableDefaults(table: Knex.CreateTableBuilder): void {
  table.engine('InnoDB');
  table.charset('utf8mb4');
  table.collate('utf8mb4_unicode_ci');
}

/** `created_at` and `updated_at` with milliseconds; MariaDB moves `updated_at` on every UPDATE of the row. */
export function addTimestamps(knex: Knex, table: Knex.CreateTableBuilder): void {
  addCreatedAt(knex, table);
  table
    .datetime('updated_at', { precision: 3 })
    .notNullable()
    .defaultTo(knex.raw('CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)'));
}

/** `created_at` alone, for append-only tables whose rows are never updated. */
export function addCreatedAt(knex: Knex, table: Knex.CreateTableBuilder): void {
  table.datetime('created_at', { precision: 3 }).notNullable().defaultTo(knex.raw('CURRENT_TIMESTAMP(3)'));
}

/** A money amount in integer minor units (cents), never negative. */
export function addCents(table: Knex.CreateTableBuilder, tableName: string, column: string): void {
  table.integer(column).notNullable().defaultTo(0);
  table.check(`\`${column}\` >= 0`, [], `${tableName}_${column}_non_negative`);
}

/** An ISO 4217 code such as USD: three capital letters (compared as bytes, since REGEXP ignores case under _ci). */
export function addCurrency(table: Knex.CreateTableBuilder, tableName: string): void {
  table.specificType('currency', 'CHAR(3)').notNullable();
  table.check("CAST(`currency` AS BINARY) REGEXP '^[A-Z]{3}$'", [], `${tableName}_currency_iso`);
}

/** Opaque identifiers from other systems (Stripe ids, share tokens) are case-sensitive: compare them byte for byte. */
export const caseSensitive = 'utf8mb4_bin';
