import type { Knex } from 'knex';
import { addCents, addTimestamps, useTableDefaults } from './support/columns.ts';

/**
 * Shipping (issue 12 §9): the shop's methods and rates (delivery at one flat charge per order, free from an amount
 * of goods, and pick-up at the studio), the shipping a quote and an order were priced with (a line of their own,
 * not taxed, so the totals now sum as subtotal + shipping + tax), the parcel's carrier and tracking number, and the
 * addresses a customer has sent orders to, offered again at their next checkout.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('shop_settings', (t) => {
    t.boolean('delivery_is_offered').notNullable().defaultTo(true);
    t.integer('delivery_flat_cents').unsigned().notNullable().defaultTo(695);
    // NULL: delivery is never free.
    t.integer('delivery_free_from_cents').unsigned().nullable().defaultTo(7500);
    t.boolean('pickup_is_offered').notNullable().defaultTo(true);
    t.string('pickup_note', 300).notNullable().defaultTo('');
    t.check('`delivery_is_offered` OR `pickup_is_offered`', [], 'shop_settings_some_shipping');
  });

  await knex.schema.alterTable('quotes', (t) => {
    t.dropChecks(['quotes_total_sums']);
  });
  await knex.schema.alterTable('quotes', (t) => {
    addCents(t, 'quotes', 'shipping_cents');
    // NULL on quotes priced before shipping was quoted.
    t.enum('shipping_method', ['delivery', 'pickup']).nullable();
    t.check('`subtotal_cents` + `shipping_cents` + `tax_cents` = `total_cents`', [], 'quotes_total_sums');
  });

  await knex.schema.alterTable('orders', (t) => {
    t.dropChecks(['orders_total_sums']);
  });
  await knex.schema.alterTable('orders', (t) => {
    addCents(t, 'orders', 'shipping_cents');
    t.enum('shipping_method', ['delivery', 'pickup']).notNullable().defaultTo('delivery');
    t.string('shipping_carrier', 60).nullable();
    t.string('tracking_number', 60).nullable();
    t.check('`subtotal_cents` + `shipping_cents` + `tax_cents` = `total_cents`', [], 'orders_total_sums');
  });

  await knex.schema.createTable('customer_addresses', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.integer('customer_id').unsigned().notNullable().references('id').inTable('users').onDelete('CASCADE');
    // { name, line1, line2?, city, region, postalCode, countryCode, phone? }, as the checkout took it.
    t.json('address').notNullable();
    // The address's fields, trimmed and lower-cased, hashed: the same address sent twice is kept once.
    t.specificType('address_key', 'CHAR(64)').notNullable();
    t.datetime('last_used_at', { precision: 3 }).notNullable();
    addTimestamps(knex, t);
    t.unique(['customer_id', 'address_key'], { indexName: 'customer_addresses_once' });
    t.index(['customer_id', 'last_used_at'], 'customer_addresses_recent');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('customer_addresses');
  await knex.schema.alterTable('orders', (t) => {
    t.dropChecks(['orders_total_sums', 'orders_shipping_cents_non_negative']);
  });
  // Without a shipping column the money shipping took is part of the subtotal, so every total still adds up.
  await knex('orders').update({ subtotal_cents: knex.raw('subtotal_cents + shipping_cents') });
  await knex.schema.alterTable('orders', (t) => {
    t.dropColumns('shipping_cents', 'shipping_method', 'shipping_carrier', 'tracking_number');
    t.check('`subtotal_cents` + `tax_cents` = `total_cents`', [], 'orders_total_sums');
  });
  await knex.schema.alterTable('quotes', (t) => {
    t.dropChecks(['quotes_total_sums', 'quotes_shipping_cents_non_negative']);
  });
  await knex('quotes').update({ subtotal_cents: knex.raw('subtotal_cents + shipping_cents') });
  await knex.schema.alterTable('quotes', (t) => {
    t.dropColumns('shipping_cents', 'shipping_method');
    t.check('`subtotal_cents` + `tax_cents` = `total_cents`', [], 'quotes_total_sums');
  });
  await knex.schema.alterTable('shop_settings', (t) => {
    t.dropChecks(['shop_settings_some_shipping']);
    t.dropColumns(
      'delivery_is_offered',
      'delivery_flat_cents',
      'delivery_free_from_cents',
      'pickup_is_offered',
      'pickup_note',
    );
  });
}
