import type { Knex } from 'knex';
import { addTimestamps, useTableDefaults } from './support/columns.ts';

const hexFormat = "CAST(`hex` AS BINARY) REGEXP '^#[0-9A-F]{6}$'";

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('motifs', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.string('slug', 80).notNullable().unique();
    t.string('name', 120).notNullable();
    // A border motif repeats end to end along a hem; a single motif is placed once.
    t.enum('kind', ['border', 'single']).notNullable();
    t.specificType('svg', 'MEDIUMTEXT').notNullable();
    t.decimal('width_mm', 8, 2).notNullable();
    t.decimal('height_mm', 8, 2).notNullable();
    // Measured from the digitized file at 100 %; the engine scales run and satin with size, fill with its square.
    t.integer('stitch_count').unsigned().notNullable();
    t.integer('run_stitches').unsigned().notNullable();
    t.integer('satin_stitches').unsigned().notNullable();
    t.integer('fill_stitches').unsigned().notNullable();
    t.tinyint('colour_count').unsigned().notNullable();
    // A stitch file only resizes within narrow limits before the stitching looks wrong.
    t.smallint('min_scale_pct').unsigned().notNullable();
    t.smallint('max_scale_pct').unsigned().notNullable();
    // Space between border repeats at 100 % (negative = overlap); it scales with the motif.
    t.decimal('gap_mm', 8, 2).notNullable().defaultTo(0);
    // Thread codes, one per colour, in stitching order.
    t.json('default_thread_codes').notNullable();
    t.boolean('is_active').notNullable().defaultTo(true);
    t.integer('sort_order').notNullable().defaultTo(0);
    t.integer('created_by_user_id').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
    addTimestamps(knex, t);
    t.index(['kind', 'is_active', 'sort_order'], 'motifs_catalog_index');
    t.check('`width_mm` > 0 AND `height_mm` > 0', [], 'motifs_size_positive');
    t.check(
      '`run_stitches` + `satin_stitches` + `fill_stitches` = `stitch_count` AND `stitch_count` > 0',
      [],
      'motifs_stitch_mix_sums',
    );
    t.check('`colour_count` >= 1', [], 'motifs_colour_count_positive');
    // 100 % is the measured size, so it always lies inside the range.
    t.check('`min_scale_pct` > 0 AND `min_scale_pct` <= 100 AND `max_scale_pct` >= 100', [], 'motifs_scale_range');
    t.check('JSON_LENGTH(`default_thread_codes`) = `colour_count`', [], 'motifs_one_thread_per_colour');
  });

  await knex.schema.createTable('lettering_fonts', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.string('slug', 80).notNullable().unique();
    t.string('name', 120).notNullable();
    t.string('font_family', 120).notNullable();
    // The font ships with the app from this npm package; file_name is its latin 400 .woff in `files/`.
    t.string('fontsource_package', 120).notNullable();
    t.string('file_name', 200).notNullable();
    t.decimal('min_height_mm', 8, 2).notNullable();
    t.decimal('max_height_mm', 8, 2).notNullable();
    t.boolean('is_active').notNullable().defaultTo(true);
    t.integer('sort_order').notNullable().defaultTo(0);
    addTimestamps(knex, t);
    t.index(['is_active', 'sort_order'], 'lettering_fonts_catalog_index');
    t.check('`min_height_mm` > 0 AND `min_height_mm` <= `max_height_mm`', [], 'lettering_fonts_height_range');
  });

  await knex.schema.createTable('threads', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.string('code', 20).notNullable().unique();
    t.string('name', 80).notNullable();
    t.specificType('hex', 'CHAR(7)').notNullable();
    // CIELAB (D65) of hex, stored so that thread matching (CIEDE2000) need not convert the palette on every request.
    t.decimal('lab_l', 8, 4).notNullable();
    t.decimal('lab_a', 8, 4).notNullable();
    t.decimal('lab_b', 8, 4).notNullable();
    t.boolean('is_active').notNullable().defaultTo(true);
    t.integer('sort_order').notNullable().defaultTo(0);
    addTimestamps(knex, t);
    t.index(['is_active', 'sort_order'], 'threads_palette_index');
    t.check(hexFormat, [], 'threads_hex_format');
  });

  await knex.schema.createTable('hoops', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.string('slug', 80).notNullable().unique();
    t.string('name', 120).notNullable();
    // The sewing field, which is smaller than the hoop frame its name rounds.
    t.decimal('field_width_mm', 8, 2).notNullable();
    t.decimal('field_height_mm', 8, 2).notNullable();
    t.boolean('is_active').notNullable().defaultTo(true);
    t.integer('sort_order').notNullable().defaultTo(0);
    addTimestamps(knex, t);
    t.index(['is_active', 'sort_order'], 'hoops_list_index');
    t.check('`field_width_mm` > 0 AND `field_height_mm` > 0', [], 'hoops_field_positive');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('hoops');
  await knex.schema.dropTable('threads');
  await knex.schema.dropTable('lettering_fonts');
  await knex.schema.dropTable('motifs');
}
