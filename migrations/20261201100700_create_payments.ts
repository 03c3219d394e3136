import type { Knex } from 'knex';
import { addCents, addCurrency, addTimestamps, caseSensitive, useTableDefaults } from './support/columns.ts';

export async function up(knex: Knex): Promise<void> {
  // One row per Stripe Checkout attempt. The card is authorized at checkout and captured only after proof approval.
  await knex.schema.createTable('payments', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.integer('order_id').unsigned().notNullable().references('id').inTable('orders').onDelete('RESTRICT');
    t.string('provider', 20).notNullable().defaultTo('stripe');
    t.string('checkout_session_id', 255).collate(caseSensitive).nullable().unique();
    t.string('payment_intent_id', 255).collate(caseSensitive).nullable().unique();
    // pending: checkout opened, no authorization yet; failed: the card was declined or the session expired.
    t.enum('status', ['pending', 'authorized', 'captured', 'partially_refunded', 'refunded', 'voided', 'failed'])
      .notNullable()
      .defaultTo('pending');
    addCents(t, 'payments', 'amount_authorized_cents');
    addCents(t, 'payments', 'amount_captured_cents');
    addCents(t, 'payments', 'amount_refunded_cents');
    addCurrency(t, 'payments');
    // Stripe's capture_before: an uncaptured authorization lapses then (7 days for online card payments).
    t.datetime('capture_before', { precision: 3 }).nullable();
    t.datetime('authorized_at', { precision: 3 }).nullable();
    t.datetime('captured_at', { precision: 3 }).nullable();
    addTimestamps(knex, t);
    t.index(['order_id', 'created_at'], 'payments_order_list_index');
    t.index(['status', 'capture_before'], 'payments_capture_due_index');
    t.check('`amount_captured_cents` <= `amount_authorized_cents`', [], 'payments_capture_within_authorization');
    t.check('`amount_refunded_cents` <= `amount_captured_cents`', [], 'payments_refund_within_capture');
  });

  // Append-only: each delivery from Stripe is recorded once, keyed by its event id so a redelivery is recognised.
  // Rows are only ever marked processed, so received_at stands in for created_at and there is no updated_at.
  await knex.schema.createTable('payment_webhook_events', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.string('event_id', 255).collate(caseSensitive).notNullable().unique();
    t.string('type', 100).notNullable();
    t.json('payload').notNullable();
    t.datetime('received_at', { precision: 3 }).notNullable().defaultTo(knex.raw('CURRENT_TIMESTAMP(3)'));
    t.datetime('processed_at', { precision: 3 }).nullable();
    t.index(['processed_at', 'received_at'], 'payment_webhook_events_queue_index');
    t.index(['received_at'], 'payment_webhook_events_received_index');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('payment_webhook_events');
  await knex.schema.dropTable('payments');
}
