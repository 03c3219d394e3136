import type { Knex } from 'knex';

/**
 * Children before parents, so no foreign key refuses a delete. Sessions are left alone: the users come back
 * with the same ids, so anyone signed in stays signed in across a re-seed.
 */
export const seededTables = [
  'email_log',
  'payments',
  'payment_webhook_events',
  'proofs',
  'order_events',
  'order_items',
  'orders',
  'quotes',
  'artwork_uploads',
  'designs',
  'pricing_rule_sets',
  'motifs',
  'lettering_fonts',
  'threads',
  'hoops',
  'fabric_colours',
  'garment_sizes',
  'garments',
  'shop_settings',
  'users',
];

/** Empties every table the seeds fill, so the following seed files can insert with fixed ids. */
export async function seed(knex: Knex): Promise<void> {
  for (const table of seededTables) await knex(table).del();
  // Rows the app adds after seeding then get the same ids on every run (InnoDB moves the counter past the
  // largest id the seeds insert).
  for (const table of seededTables) {
    if (table !== 'shop_settings') await knex.raw('ALTER TABLE ?? AUTO_INCREMENT = 1', [table]);
  }
}
