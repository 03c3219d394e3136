import type { Db } from '../../db/knex.ts';
import { storedColumns, toStoredDesign, type OwnedDesignKey, type StoredDesign } from './design-repo.ts';

/** The design behind a shared link, whoever owns it; undefined once the link is switched off. */
export async function findDesignByShareToken(
  db: Db,
  shareToken: string,
): Promise<(StoredDesign & { customerId: number }) | undefined> {
  const row = await db('designs')
    .select([...storedColumns, 'customer_id'])
    .where({ share_token: shareToken })
    .first();
  return row ? { ...toStoredDesign(row), customerId: row.customer_id as number } : undefined;
}

/** The customer's design's link code (null when not shared), or undefined when they have no such design. */
export async function findOwnedShareToken(db: Db, key: OwnedDesignKey): Promise<string | null | undefined> {
  const row = await db('designs')
    .select('share_token')
    .where({ id: key.id, customer_id: key.customerId })
    .forUpdate()
    .first();
  return row ? ((row.share_token as string | null) ?? null) : undefined;
}

/**
 * Sets or clears the link code of the customer's design; false when they have no such design. `updated_at` is kept:
 * sharing is not a change to the design, and the list stays in the order of the customer's edits.
 */
export async function setOwnedShareToken(db: Db, key: OwnedDesignKey, shareToken: string | null): Promise<boolean> {
  const matched = await db('designs')
    .where({ id: key.id, customer_id: key.customerId })
    .update({ share_token: shareToken, updated_at: db.ref('updated_at') });
  return matched > 0;
}

/** Renames the customer's design; false when they have no such design. */
export async function renameOwnedDesign(db: Db, key: OwnedDesignKey, name: string, renamedAt: Date): Promise<boolean> {
  const matched = await db('designs')
    .where({ id: key.id, customer_id: key.customerId })
    .update({ name, updated_at: renamedAt });
  return matched > 0;
}
