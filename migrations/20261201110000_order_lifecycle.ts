import type { Knex } from 'knex';

/**
 * The order lifecycle of the storefront and studio work: the status that follows a held card is named for what it
 * is (`authorized`), a fully refunded order has its own final status, e-mails keep their text for the studio's
 * outbox, a proof records whether it is a render or a photo and the customer's words, and the shop settings gain
 * the lead time and weekly machine hours that due dates and capacity charts are worked out from.
 */
const before = [
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
const during = [...before, 'authorized', 'refunded'];
const after = during.filter((status) => status !== 'needs_proof');
const enumOf = (values: string[]) => `ENUM(${values.map((v) => `'${v}'`).join(', ')})`;

async function setStatusEnums(knex: Knex, values: string[]): Promise<void> {
  await knex.raw(`ALTER TABLE orders MODIFY status ${enumOf(values)} NOT NULL DEFAULT 'awaiting_payment'`);
  await knex.raw(
    `ALTER TABLE order_events MODIFY from_status ${enumOf(values)} NULL, MODIFY to_status ${enumOf(values)} NULL`,
  );
}

async function renameStatus(knex: Knex, from: string, to: string): Promise<void> {
  await knex('orders').where({ status: from }).update({ status: to });
  await knex('order_events').where({ from_status: from }).update({ from_status: to });
  await knex('order_events').where({ to_status: from }).update({ to_status: to });
}

export async function up(knex: Knex): Promise<void> {
  await setStatusEnums(knex, during);
  await renameStatus(knex, 'needs_proof', 'authorized');
  await setStatusEnums(knex, after);

  await knex.schema.alterTable('email_log', (t) => {
    // What the message said, for the outbox; MEDIUMTEXT because an HTML body with inline styles can pass 64 KB.
    t.specificType('text_body', 'MEDIUMTEXT').nullable();
    t.specificType('html_body', 'MEDIUMTEXT').nullable();
  });

  await knex.schema.alterTable('proofs', (t) => {
    // render: drawn by the server from the design on the mockup; photo: a picture of a test stitch-out.
    t.enum('source', ['render', 'photo']).notNullable().defaultTo('render');
    // The customer's answer: what to change (pins hold the comments tied to a point on the image).
    t.text('customer_comment').nullable();
  });

  await knex.schema.alterTable('shop_settings', (t) => {
    // Working days from approval to ready; an order needed sooner is a rush.
    t.smallint('lead_time_days').unsigned().notNullable().defaultTo(10);
    // Machine hours the studio can stitch in a week, for the capacity chart.
    t.decimal('machine_hours_per_week', 6, 2).notNullable().defaultTo(30);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('shop_settings', (t) => {
    t.dropColumn('lead_time_days');
    t.dropColumn('machine_hours_per_week');
  });
  await knex.schema.alterTable('proofs', (t) => {
    t.dropColumn('source');
    t.dropColumn('customer_comment');
  });
  await knex.schema.alterTable('email_log', (t) => {
    t.dropColumn('text_body');
    t.dropColumn('html_body');
  });
  // A refunded order goes back to shipped: the refund itself stays in the payments table.
  await setStatusEnums(knex, during);
  await renameStatus(knex, 'authorized', 'needs_proof');
  await renameStatus(knex, 'refunded', 'shipped');
  await setStatusEnums(knex, before);
}
