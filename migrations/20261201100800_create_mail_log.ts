import type { Knex } from 'knex';
import { addTimestamps, useTableDefaults } from './support/columns.ts';

export async function up(knex: Knex): Promise<void> {
  // Every message the server hands to SMTP, so the shop can see what a customer was told and when.
  await knex.schema.createTable('email_log', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.string('to_email', 320).notNullable();
    t.string('subject', 300).notNullable();
    t.string('template', 60).notNullable();
    t.integer('order_id').unsigned().nullable().references('id').inTable('orders').onDelete('RESTRICT');
    t.enum('status', ['queued', 'sent', 'failed']).notNullable().defaultTo('queued');
    t.string('provider_message_id', 255).nullable();
    t.text('error').nullable();
    addTimestamps(knex, t);
    t.index(['created_at'], 'email_log_list_index');
    t.index(['order_id', 'created_at'], 'email_log_order_list_index');
    t.index(['status', 'created_at'], 'email_log_status_index');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('email_log');
}
