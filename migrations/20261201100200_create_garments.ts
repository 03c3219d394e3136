import type { Knex } from 'knex';
import { addTimestamps, useTableDefaults } from './support/columns.ts';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('garments', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.string('slug', 80).notNullable().unique();
    t.string('name', 120).notNullable();
    t.enum('kind', ['dress', 'romper', 'bishop_dress', 'bib', 'bonnet']).notNullable();
    t.text('description').notNullable();
    // Fabric type and nap drive the stabilizer and topping advice (issue 3 §7).
    t.enum('fabric_type', ['woven', 'knit', 'sheer']).notNullable();
    t.boolean('is_napped').notNullable().defaultTo(false);
    t.smallint('min_age_months').unsigned().notNullable();
    t.smallint('max_age_months').unsigned().notNullable();
    // A flat front outline drawn at the reference size (mockup_scale 1), viewBox in millimetres.
    t.specificType('mockup_svg', 'MEDIUMTEXT').notNullable();
    t.boolean('is_active').notNullable().defaultTo(true);
    t.integer('sort_order').notNullable().defaultTo(0);
    addTimestamps(knex, t);
    t.index(['is_active', 'sort_order'], 'garments_catalog_index');
    t.check('`min_age_months` <= `max_age_months`', [], 'garments_age_range');
  });

  await knex.schema.createTable('garment_sizes', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.integer('garment_id').unsigned().notNullable().references('id').inTable('garments').onDelete('CASCADE');
    t.string('code', 10).notNullable();
    t.string('label', 40).notNullable();
    t.integer('sort_order').notNullable().defaultTo(0);
    // Hem run lengths at the border's guide line: the front panel (an open run) and the whole way round (a closed
    // loop). NULL on garments that take no hem border (bibs, bonnets).
    t.decimal('hem_front_mm', 8, 2).nullable();
    t.decimal('hem_circumference_mm', 8, 2).nullable();
    // The factor that draws garments.mockup_svg at this size; the zones below are already in this size's millimetres.
    t.decimal('mockup_scale', 6, 4).notNullable().defaultTo(1);
    // [{ code: 'hem'|'chest'|'collar'|'bib_centre'|'brim', label, xMm, yMm, widthMm, heightMm, hemOffsetMm? }]
    t.json('placement_zones').notNullable();
    addTimestamps(knex, t);
    t.unique(['garment_id', 'code'], { indexName: 'garment_sizes_garment_code_unique' });
    t.index(['garment_id', 'sort_order'], 'garment_sizes_list_index');
    t.check(
      '(`hem_front_mm` IS NULL AND `hem_circumference_mm` IS NULL) OR ' +
        '(`hem_front_mm` > 0 AND `hem_front_mm` <= `hem_circumference_mm`)',
      [],
      'garment_sizes_hem_lengths',
    );
    t.check('`mockup_scale` > 0', [], 'garment_sizes_mockup_scale_positive');
  });

  await knex.schema.createTable('fabric_colours', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.integer('garment_id').unsigned().notNullable().references('id').inTable('garments').onDelete('CASCADE');
    t.string('name', 80).notNullable();
    t.specificType('hex', 'CHAR(7)').notNullable();
    t.integer('sort_order').notNullable().defaultTo(0);
    addTimestamps(knex, t);
    t.unique(['garment_id', 'name'], { indexName: 'fabric_colours_garment_name_unique' });
    t.index(['garment_id', 'sort_order'], 'fabric_colours_list_index');
    t.check("CAST(`hex` AS BINARY) REGEXP '^#[0-9A-F]{6}$'", [], 'fabric_colours_hex_format');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('fabric_colours');
  await knex.schema.dropTable('garment_sizes');
  await knex.schema.dropTable('garments');
}
