import type { Db } from '../../db/knex.ts';
import type { ShippingSettings } from '../../contracts/shipping.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import type { ShippingRates } from '../../engine/index.ts';
import { readShippingRates, updateShippingRates } from './shipping-settings-repo.ts';

const noSettings = () => failure('conflict', 'The studio has no settings yet; run the set-up first.');

/** The shop's shipping methods and rates as checkout checks a chosen method against them; `db` may be a transaction. */
export async function shippingRatesOf(db: Db): Promise<ShippingRates | undefined> {
  return readShippingRates(db);
}

/** Delivery and pick-up: staff read them, the owner changes them. */
export function createShippingSettingsService(deps: { db: Db; now: () => Date }) {
  return {
    async read(): Promise<Result<ShippingSettings>> {
      const rates = await readShippingRates(deps.db);
      return rates ? ok(rates) : noSettings();
    },
    async update(settings: ShippingSettings): Promise<Result<ShippingSettings>> {
      if (!(await updateShippingRates(deps.db, settings, deps.now()))) return noSettings();
      const stored = await readShippingRates(deps.db);
      return stored ? ok(stored) : noSettings();
    },
  };
}

export type ShippingSettingsService = ReturnType<typeof createShippingSettingsService>;
