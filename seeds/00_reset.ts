import type { Knex } from 'knex';

/**
 * Children before parents, so no foreign key refuses a delete. Sessions are left alone: the users come back
 * with the same ids, so anyone signed in stays signed in across a re-seed.
 */
export const seededTables = [
  'jobs',
  'job_leases',
  'rate_limits',
  'email_log',
  'payments',
  'payment_webhook_events',
  'placement_stitch_files',
  'proofs',
  'order_events',
  'order_items',
  'orders',
  'customer_addresses',
  'quotes',
  'artwork_uploads',
  'artwork_owner_locks',
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

/**
 * Empties every table the seeds fill, so the following seed files can insert with fixed ids. The demo replaces real
 * data wholesale, so it refuses a database where anyone but demo and test people (addresses ending in .test) has
 * signed in: a `db:seed` pointed at the shop's live database by mistake stops here.
 */
export async function seed(knex: Knex): Promise<void> {
  const [{ n }] = await knex('users').whereNot('email', 'like', '%.test').count({ n: '*' });
  if (Number(n) > 0) {
    throw new Error(
      `This database has ${n} real customer or staff accounts; the demo seeds would erase them, so nothing was changed.`,
    );
  }
  for (const table of seededTables) await knex(table).del();
  // Rows the app adds after seeding then get the same ids on every run (InnoDB moves the counter past the
  // largest id the seeds insert).
  for (const table of seededTables) {
    if (table !== 'shop_settings') await knex.raw('ALTER TABLE ?? AUTO_INCREMENT = 1', [table]);
  }
}
