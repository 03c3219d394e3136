import type { Knex } from 'knex';

/**
 * Indexes for the studio's order board at tens of thousands of orders: each sort the board offers can read its
 * first page from an index instead of sorting the whole table, a status filter with the due-date sort and the
 * calendar's due range stay range scans, and customers are found by a word of their name (a FULLTEXT index, so a
 * search for a surname needs no leading-wildcard LIKE over every row).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('orders', (t) => {
    t.index(['placed_at', 'id'], 'orders_placed_index');
    t.index(['total_cents', 'id'], 'orders_total_index');
    t.index(['status', 'needed_by'], 'orders_status_due_index');
  });
  await knex.raw('ALTER TABLE users ADD FULLTEXT INDEX users_name_fulltext (name)');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('ALTER TABLE users DROP INDEX users_name_fulltext');
  await knex.schema.alterTable('orders', (t) => {
    t.dropIndex(['placed_at', 'id'], 'orders_placed_index');
    t.dropIndex(['total_cents', 'id'], 'orders_total_index');
    t.dropIndex(['status', 'needed_by'], 'orders_status_due_index');
  });
}
