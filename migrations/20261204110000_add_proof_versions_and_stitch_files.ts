import type { Knex } from 'knex';
import { addTimestamps, useTableDefaults } from './support/columns.ts';

/**
 * What the studio learns when it digitizes a customer's picture, and what each proof carries.
 *
 * `placement_stitch_files`: one row per upload placement of an order once the studio has made its stitch file: the
 * stitch count and colours the machine will sew (which price the placement from then on) and the file's name.
 *
 * `proofs` gain the design they show (the studio may have changed it), the price that design comes to, the order's
 * total when the proof was sent (what the customer had authorized) and, in words, what changed since the version
 * before. Seeded history has none of them, so all are nullable.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('placement_stitch_files', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.integer('order_id').unsigned().notNullable().references('id').inTable('orders').onDelete('RESTRICT');
    // The placement's id in the order's design document.
    t.string('placement_id', 40).notNullable();
    t.integer('stitch_count').unsigned().notNullable();
    t.smallint('colour_count').unsigned().notNullable();
    t.string('file_name', 120).notNullable();
    t.integer('entered_by').unsigned().notNullable().references('id').inTable('users').onDelete('RESTRICT');
    addTimestamps(knex, t);
    t.unique(['order_id', 'placement_id'], { indexName: 'placement_stitch_files_placement_unique' });
    t.check('`stitch_count` >= 1', [], 'placement_stitch_files_stitches_positive');
    t.check('`colour_count` >= 1', [], 'placement_stitch_files_colours_positive');
  });

  await knex.schema.alterTable('proofs', (t) => {
    t.json('design_document').nullable();
    t.json('price_lines').nullable();
    t.integer('subtotal_cents').nullable();
    t.integer('tax_cents').nullable();
    t.integer('total_cents').nullable();
    t.integer('previous_total_cents').nullable();
    // ["Name moved 5 mm up", …]: sentences for the customer and the studio's history.
    t.json('changes').nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('proofs', (t) => {
    t.dropColumn('design_document');
    t.dropColumn('price_lines');
    t.dropColumn('subtotal_cents');
    t.dropColumn('tax_cents');
    t.dropColumn('total_cents');
    t.dropColumn('previous_total_cents');
    t.dropColumn('changes');
  });
  await knex.schema.dropTable('placement_stitch_files');
}
