import type { Db } from '../knex.ts';

/** What checkout needs from the shop's settings: who to tell, where the shop is and how long work takes. */
export interface ShopSchedule {
  name: string;
  contactEmail: string;
  timezone: string;
  /** Working days from approval to ready. */
  leadTimeDays: number;
}

/** The single settings row; the seeds and the studio's setup always create it. */
export async function readShopSchedule(db: Db): Promise<ShopSchedule> {
  const row = await db('shop_settings').select('name', 'contact_email', 'timezone', 'lead_time_days').where({ id: 1 }).first();
  if (!row) throw new Error('shop_settings has no row 1; run the seeds or the studio setup.');
  return { name: row.name, contactEmail: row.contact_email, timezone: row.timezone, leadTimeDays: row.lead_time_days };
}
