import type { Db } from '../../db/knex.ts';
import { SHIPPING_RATE_COLUMNS, shippingRateColumns, shippingRatesOfRow } from '../../db/shipping-rates-columns.ts';
import type { ShippingRates } from '../../engine/index.ts';

/** The shop's shipping methods and rates from the single settings row; undefined before the shop is set up. */
export async function readShippingRates(db: Db): Promise<ShippingRates | undefined> {
  const row = await db('shop_settings')
    .select(...SHIPPING_RATE_COLUMNS)
    .where({ id: 1 })
    .first();
  return row && shippingRatesOfRow(row);
}

/** Writes the shipping methods and rates; false when the shop has no settings row yet. */
export async function updateShippingRates(db: Db, rates: ShippingRates, now: Date): Promise<boolean> {
  const changed = await db('shop_settings')
    .where({ id: 1 })
    .update({ ...shippingRateColumns(rates), updated_at: now });
  return changed === 1;
}
