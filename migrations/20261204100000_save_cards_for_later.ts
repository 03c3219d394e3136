import type { Knex } from 'knex';
import { caseSensitive } from './support/columns.ts';

/**
 * Cards kept for later. A hold lasts about a week, so an order whose work is due after that saves the card instead
 * (`saved`: nothing held) and is charged off-session when the customer approves the proof. Each payment row says
 * how it takes money (`method`), which customer and card at the provider it may charge again, and, for a payment
 * the customer's bank wants them to confirm, the payment page they were sent.
 */
const rowStatuses = ['pending', 'authorized', 'captured', 'partially_refunded', 'refunded', 'voided', 'failed'];
const orderStatuses = ['none', 'authorized', 'captured', 'partially_refunded', 'refunded', 'voided'];
const enumOf = (values: string[]) => `ENUM(${values.map((v) => `'${v}'`).join(', ')})`;

export async function up(knex: Knex): Promise<void> {
  await knex.raw(`ALTER TABLE payments MODIFY status ${enumOf([...rowStatuses, 'saved'])} NOT NULL DEFAULT 'pending'`);
  await knex.raw(
    `ALTER TABLE orders MODIFY payment_status ${enumOf([...orderStatuses, 'saved'])} NOT NULL DEFAULT 'none'`,
  );
  await knex.schema.alterTable('payments', (t) => {
    // hold: checkout held the card (and kept it); saved_card: checkout kept the card only; off_session: the studio's
    // charge of a kept card; payment_link: a page the customer pays on when their bank asks for them.
    t.enum('method', ['hold', 'saved_card', 'off_session', 'payment_link']).notNullable().defaultTo('hold');
    t.string('provider_customer_id', 255).collate(caseSensitive).nullable();
    t.string('payment_method_id', 255).collate(caseSensitive).nullable();
    t.string('payment_page_url', 2048).nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('payments', (t) => {
    t.dropColumn('payment_page_url');
    t.dropColumn('payment_method_id');
    t.dropColumn('provider_customer_id');
    t.dropColumn('method');
  });
  await knex('payments').where({ status: 'saved' }).update({ status: 'voided' });
  await knex('orders').where({ payment_status: 'saved' }).update({ payment_status: 'voided' });
  await knex.raw(`ALTER TABLE orders MODIFY payment_status ${enumOf(orderStatuses)} NOT NULL DEFAULT 'none'`);
  await knex.raw(`ALTER TABLE payments MODIFY status ${enumOf(rowStatuses)} NOT NULL DEFAULT 'pending'`);
}
