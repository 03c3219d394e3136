import type { Db } from '../../db/knex.ts';
import type { ShopSettings } from '../../contracts/admin-settings.ts';
import { jsonColumn } from '../../db/json-column.ts';

/** What checkout needs from the shop's settings: who to tell, where the shop is and how long work takes. */
export interface ShopSchedule {
  name: string;
  contactEmail: string;
  timezone: string;
  /** Working days from approval to ready. */
  leadTimeDays: number;
  /** Days of the week the shop is shut, 0 Sunday to 6 Saturday. */
  closedWeekdays: number[];
  /** Single closed days (holidays), YYYY-MM-DD. */
  holidays: string[];
}

/** The single settings row; the seeds and the studio's setup always create it. */
export async function readShopSchedule(db: Db): Promise<ShopSchedule> {
  const row = await db('shop_settings')
    .select('name', 'contact_email', 'timezone', 'lead_time_days', 'closed_weekdays', 'holidays')
    .where({ id: 1 })
    .first();
  if (!row) throw new Error('shop_settings has no row 1; run the seeds or the studio setup.');
  return {
    name: row.name,
    contactEmail: row.contact_email,
    timezone: row.timezone,
    leadTimeDays: row.lead_time_days,
    closedWeekdays: jsonColumn(row.closed_weekdays) as number[],
    holidays: jsonColumn(row.holidays) as string[],
  };
}

/** The studio's pace and capacity from the single shop_settings row; DECIMAL columns arrive as strings. */
export async function readShopSettings(db: Db): Promise<ShopSettings | undefined> {
  const row = await db('shop_settings')
    .select(
      'machine_stitches_per_minute',
      'minutes_per_hooping',
      'minutes_per_colour_change',
      'setup_minutes',
      'lead_time_days',
      'machine_hours_per_week',
      'timezone',
      'closed_weekdays',
      'holidays',
    )
    .where({ id: 1 })
    .first();
  return (
    row && {
      machineStitchesPerMinute: row.machine_stitches_per_minute,
      minutesPerHooping: Number(row.minutes_per_hooping),
      minutesPerColourChange: Number(row.minutes_per_colour_change),
      setupMinutes: Number(row.setup_minutes),
      leadTimeDays: row.lead_time_days,
      machineHoursPerWeek: Number(row.machine_hours_per_week),
      timeZone: row.timezone,
      closedWeekdays: jsonColumn(row.closed_weekdays) as number[],
      holidays: jsonColumn(row.holidays) as string[],
    }
  );
}

/** Writes the settings; false when the shop has no settings row yet. */
export async function updateShopSettings(db: Db, settings: ShopSettings, now: Date): Promise<boolean> {
  const changed = await db('shop_settings')
    .where({ id: 1 })
    .update({
      machine_stitches_per_minute: settings.machineStitchesPerMinute,
      minutes_per_hooping: settings.minutesPerHooping,
      minutes_per_colour_change: settings.minutesPerColourChange,
      setup_minutes: settings.setupMinutes,
      lead_time_days: settings.leadTimeDays,
      machine_hours_per_week: settings.machineHoursPerWeek,
      timezone: settings.timeZone,
      closed_weekdays: JSON.stringify([...settings.closedWeekdays].sort()),
      holidays: JSON.stringify([...new Set(settings.holidays)].sort()),
      updated_at: now,
    });
  return changed === 1;
}
