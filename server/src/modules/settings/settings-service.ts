import type { Db } from '../../db/knex.ts';
import type { ShopSettings } from '../../contracts/admin-settings.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import type { ShopCalendar } from '../../engine/index.ts';
import { readShopSchedule, readShopSettings, updateShopSettings, type ShopSchedule } from './shop-settings-repo.ts';

export type { ShopSchedule };

/**
 * The shop's name, time zone and lead time, as every date rule and message reads them (checkout, ready dates,
 * payment e-mails). `db` may be the caller's transaction.
 */
export const shopScheduleOf = (db: Db): Promise<ShopSchedule> => readShopSchedule(db);

/** The shop's calendar as the engine's date rules take it: its zone, closed days and lead time. */
export async function shopCalendarOf(db: Db): Promise<ShopCalendar & { leadTimeDays: number }> {
  const shop = await readShopSchedule(db);
  return {
    timeZone: shop.timezone,
    closedWeekdays: shop.closedWeekdays,
    holidays: shop.holidays,
    leadTimeDays: shop.leadTimeDays,
  };
}

const noSettings = () => failure('conflict', 'The studio has no settings yet; run the set-up first.');

/** The machine's pace and the studio's capacity: staff read them, the owner changes them. */
export function createSettingsService(deps: { db: Db; now: () => Date }) {
  return {
    async read(): Promise<Result<ShopSettings>> {
      const settings = await readShopSettings(deps.db);
      return settings ? ok(settings) : noSettings();
    },
    async update(settings: ShopSettings): Promise<Result<ShopSettings>> {
      if (!(await updateShopSettings(deps.db, settings, deps.now()))) return noSettings();
      const stored = await readShopSettings(deps.db);
      return stored ? ok(stored) : noSettings();
    },
  };
}

export type SettingsService = ReturnType<typeof createSettingsService>;
