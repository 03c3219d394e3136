import type { Knex } from 'knex';
import { addCents, addCurrency, addTimestamps, caseSensitive, useTableDefaults } from './support/columns.ts';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('designs', (t) => {
    useTableDefaults(t);
    t.increments('id');
    // A customer's saved designs are theirs: they go with the account (orders keep theirs through RESTRICT below).
    t.integer('customer_id').unsigned().notNullable().references('id').inTable('users').onDelete('CASCADE');
    t.integer('garment_id').unsigned().notNullable().references('id').inTable('garments').onDelete('RESTRICT');
    t.integer('garment_size_id')
      .unsigned()
      .notNullable()
      .references('id')
      .inTable('garment_sizes')
      .onDelete('RESTRICT');
    t.integer('fabric_colour_id')
      .unsigned()
      .notNullable()
      .references('id')
      .inTable('fabric_colours')
      .onDelete('RESTRICT');
    t.string('name', 120).notNullable();
    // The versioned design document (server/src/contracts/designs.ts); document_version tells restoreDesign which
    // migration steps an older document needs.
    t.json('document').notNullable();
    t.smallint('document_version').unsigned().notNullable();
    // Anyone with the link may view the design; NULL until the customer shares it.
    t.string('share_token', 64).collate(caseSensitive).nullable().unique();
    addTimestamps(knex, t);
    t.index(['customer_id', 'updated_at'], 'designs_customer_list_index');
  });

  await knex.schema.createTable('artwork_uploads', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.integer('owner_user_id').unsigned().notNullable().references('id').inTable('users').onDelete('CASCADE');
    t.string('original_name', 255).notNullable();
    t.string('mime_type', 100).notNullable();
    t.integer('byte_size').unsigned().notNullable();
    // Only the cleaned copy is kept: an SVG after sanitizing, or a raster upload re-encoded as PNG.
    t.specificType('sanitized_svg', 'MEDIUMTEXT').nullable();
    t.specificType('png', 'MEDIUMBLOB').nullable();
    t.integer('width_px').unsigned().notNullable();
    t.integer('height_px').unsigned().notNullable();
    addTimestamps(knex, t);
    t.index(['owner_user_id', 'created_at'], 'artwork_uploads_owner_list_index');
    t.check('`sanitized_svg` IS NOT NULL OR `png` IS NOT NULL', [], 'artwork_uploads_has_content');
  });

  await knex.schema.createTable('quotes', (t) => {
    useTableDefaults(t);
    t.increments('id');
    // A quote outlives the draft it priced: input holds everything needed to show it again.
    t.integer('design_id').unsigned().nullable().references('id').inTable('designs').onDelete('SET NULL');
    // NULL for a visitor who has not signed in yet.
    t.integer('customer_id').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
    // The price list version this quote was priced with; it stays even after a newer version is published.
    t.integer('pricing_rule_set_id')
      .unsigned()
      .notNullable()
      .references('id')
      .inTable('pricing_rule_sets')
      .onDelete('RESTRICT');
    t.integer('quantity').unsigned().notNullable();
    t.boolean('is_rush').notNullable().defaultTo(false);
    // The engine's input and its priced lines [{ code, label, amountCents }], kept as computed.
    t.json('input').notNullable();
    t.json('lines').notNullable();
    addCents(t, 'quotes', 'subtotal_cents');
    addCents(t, 'quotes', 'tax_cents');
    addCents(t, 'quotes', 'total_cents');
    addCurrency(t, 'quotes');
    // Stitches, hoopings and colour changes are per garment; run_minutes is machine time for the whole quantity.
    t.integer('stitch_count').unsigned().notNullable();
    t.smallint('hooping_count').unsigned().notNullable();
    t.smallint('colour_change_count').unsigned().notNullable();
    t.decimal('run_minutes', 8, 2).notNullable();
    t.datetime('expires_at', { precision: 3 }).notNullable();
    addTimestamps(knex, t);
    t.index(['customer_id', 'created_at'], 'quotes_customer_list_index');
    t.index(['design_id', 'created_at'], 'quotes_design_list_index');
    t.check('`quantity` >= 1', [], 'quotes_quantity_positive');
    t.check('`subtotal_cents` + `tax_cents` = `total_cents`', [], 'quotes_total_sums');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('quotes');
  await knex.schema.dropTable('artwork_uploads');
  await knex.schema.dropTable('designs');
}
