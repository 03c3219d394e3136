import type { Knex } from 'knex';

/**
 * One order per stored quote and design: the placement key names the pair, and its unique index makes the second of
 * two identical checkouts (a double click, a retry after a lost answer, requests in parallel) find the first order
 * instead of making another. Orders placed before this have their keys filled in from their item.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('orders', (t) => {
    t.string('placement_key', 64).nullable();
  });
  await knex.raw(
    "UPDATE orders o JOIN order_items i ON i.order_id = o.id SET o.placement_key = CONCAT('quote-', o.quote_id, '-design-', i.design_id)",
  );
  await knex.schema.alterTable('orders', (t) => {
    t.unique(['placement_key'], { indexName: 'orders_placement_key_unique' });
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('orders', (t) => {
    t.dropUnique(['placement_key'], 'orders_placement_key_unique');
    t.dropColumn('placement_key');
  });
}
