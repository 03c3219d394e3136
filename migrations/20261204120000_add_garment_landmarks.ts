import type { Knex } from 'knex';

/**
 * The marks on a garment an embroiderer measures a placement from, besides the centre front and the hem: the
 * neckline's lowest point at the centre front, a bonnet's brim edge. Each is `{ label, yMm }`, mm down the front
 * drawing at its reference size (scaled with the drawing for each size), on the centre-front line. Null when the
 * garment has none; the production sheet then measures from the hem or the garment's top edge.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('garments', (t) => {
    t.json('landmarks').nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('garments', (t) => {
    t.dropColumn('landmarks');
  });
}
