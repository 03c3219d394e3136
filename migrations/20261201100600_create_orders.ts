import type { Knex } from 'knex';
import { addCents, addCreatedAt, addCurrency, addTimestamps, useTableDefaults } from './support/columns.ts';

const orderStatuses = [
  'awaiting_payment',
  'needs_proof',
  'proof_sent',
  'changes_requested',
  'proof_approved',
  'in_production',
  'stitched',
  'shipped',
  'cancelled',
];
const paymentStatuses = ['none', 'authorized', 'captured', 'partially_refunded', 'refunded', 'voided'];

export async function up(knex: Knex): Promise<void> {
  // Orders, their events, proofs and payments are the shop's records: nothing that references them cascades, and a
  // customer or quote with orders cannot be deleted. Orders are cancelled, not deleted.
  await knex.schema.createTable('orders', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.string('number', 20).notNullable().unique();
    t.integer('customer_id').unsigned().notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.integer('quote_id').unsigned().notNullable().references('id').inTable('quotes').onDelete('RESTRICT');
    t.enum('status', orderStatuses).notNullable().defaultTo('awaiting_payment');
    t.enum('payment_status', paymentStatuses).notNullable().defaultTo('none');
    addCents(t, 'orders', 'subtotal_cents');
    addCents(t, 'orders', 'tax_cents');
    addCents(t, 'orders', 'total_cents');
    addCurrency(t, 'orders');
    t.date('needed_by').nullable();
    // { name, line1, line2?, city, region, postalCode, countryCode, phone? }
    t.json('ship_to').notNullable();
    t.text('customer_note').nullable();
    // When the card was authorized and the order joined the shop's queue; NULL while awaiting payment.
    t.datetime('placed_at', { precision: 3 }).nullable();
    addTimestamps(knex, t);
    t.index(['status', 'placed_at'], 'orders_board_index');
    t.index(['customer_id', 'placed_at'], 'orders_customer_list_index');
    t.index(['needed_by'], 'orders_needed_by_index');
    t.check('`subtotal_cents` + `tax_cents` = `total_cents`', [], 'orders_total_sums');
    // An order cancelled before payment was never placed, so cancelled orders may have either.
    t.check(
      "`status` = 'cancelled' OR (`status` = 'awaiting_payment') = (`placed_at` IS NULL)",
      [],
      'orders_placed_at',
    );
  });

  await knex.schema.createTable('order_items', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.integer('order_id').unsigned().notNullable().references('id').inTable('orders').onDelete('CASCADE');
    t.integer('design_id').unsigned().notNullable().references('id').inTable('designs').onDelete('RESTRICT');
    t.integer('garment_size_id')
      .unsigned()
      .notNullable()
      .references('id')
      .inTable('garment_sizes')
      .onDelete('RESTRICT');
    t.integer('quantity').unsigned().notNullable();
    addCents(t, 'order_items', 'unit_price_cents');
    addCents(t, 'order_items', 'total_cents');
    t.string('description', 300).notNullable();
    addTimestamps(knex, t);
    t.check('`quantity` >= 1', [], 'order_items_quantity_positive');
  });

  // Append-only: an event records what happened and is never updated, so it has created_at and no updated_at.
  await knex.schema.createTable('order_events', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.integer('order_id').unsigned().notNullable().references('id').inTable('orders').onDelete('RESTRICT');
    // NULL when the system acted (a payment webhook, an expiry).
    t.integer('actor_user_id').unsigned().nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.string('type', 40).notNullable();
    t.enum('from_status', orderStatuses).nullable();
    t.enum('to_status', orderStatuses).nullable();
    t.text('note').nullable();
    t.json('payload').nullable();
    addCreatedAt(knex, t);
    t.index(['order_id', 'created_at'], 'order_events_history_index');
  });

  await knex.schema.createTable('proofs', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.integer('order_id').unsigned().notNullable().references('id').inTable('orders').onDelete('RESTRICT');
    t.smallint('version').unsigned().notNullable();
    // superseded: the shop sent a newer version before the customer answered this one.
    t.enum('status', ['sent', 'approved', 'changes_requested', 'superseded']).notNullable().defaultTo('sent');
    t.specificType('image_png', 'MEDIUMBLOB').nullable();
    t.text('message').nullable();
    // The customer's pointers on the image: [{ xPct, yPct, comment }], positions as % of the image.
    t.json('comment_pins').notNullable();
    t.integer('sent_by_user_id').unsigned().notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.datetime('responded_at', { precision: 3 }).nullable();
    addTimestamps(knex, t);
    t.unique(['order_id', 'version'], { indexName: 'proofs_order_version_unique' });
    t.check('`version` >= 1', [], 'proofs_version_positive');
    t.check(
      "(`status` IN ('approved', 'changes_requested')) = (`responded_at` IS NOT NULL)",
      [],
      'proofs_responded_at',
    );
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('proofs');
  await knex.schema.dropTable('order_events');
  await knex.schema.dropTable('order_items');
  await knex.schema.dropTable('orders');
}
