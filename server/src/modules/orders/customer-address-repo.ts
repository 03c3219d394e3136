import { createHash } from 'node:crypto';
import type { Db } from '../../db/knex.ts';
import { jsonColumn } from '../../db/json-column.ts';
import type { ShipTo } from '../../contracts/orders.ts';

/** A customer's addresses are kept to their most recent few; older ones drop off the list offered at checkout. */
export const MAX_SAVED_ADDRESSES = 10;

/** An address as checkout takes it; the optional lines may be left out. */
type AddressFields = Omit<ShipTo, 'line2' | 'phone'> & { line2?: string; phone?: string };

export interface SavedAddressRecord {
  id: number;
  address: ShipTo;
  lastUsedAt: Date;
}

/** One key per address, whatever its case or spacing, so the same address ordered to twice is kept once. */
function addressKey(address: AddressFields): string {
  const fields = [
    address.name,
    address.line1,
    address.line2 ?? '',
    address.city,
    address.region,
    address.postalCode,
    address.countryCode,
    address.phone ?? '',
  ];
  const normal = fields.map((field) => field.trim().replace(/\s+/g, ' ').toLowerCase()).join('\u0000');
  return createHash('sha256').update(normal).digest('hex');
}

/** Keeps the address the customer ordered to (or marks it used again); `trx` is the order's transaction. */
export async function rememberAddress(trx: Db, customerId: number, address: AddressFields, now: Date): Promise<void> {
  await trx('customer_addresses')
    .insert({
      customer_id: customerId,
      address: JSON.stringify(address),
      address_key: addressKey(address),
      last_used_at: now,
      created_at: now,
      updated_at: now,
    })
    .onConflict(['customer_id', 'address_key'])
    .merge({ address: JSON.stringify(address), last_used_at: now, updated_at: now });
}

/** The customer's own saved addresses, the most recently used first. */
export async function listSavedAddresses(db: Db, customerId: number): Promise<SavedAddressRecord[]> {
  const rows = await db('customer_addresses')
    .select('id', 'address', 'last_used_at')
    .where({ customer_id: customerId })
    .orderBy([
      { column: 'last_used_at', order: 'desc' },
      { column: 'id', order: 'desc' },
    ])
    .limit(MAX_SAVED_ADDRESSES);
  return rows.map((row) => ({
    id: row.id,
    address: jsonColumn(row.address) as ShipTo,
    lastUsedAt: new Date(row.last_used_at),
  }));
}

/** Forgets one of the customer's addresses; false when it is not theirs (or not there). */
export async function deleteSavedAddress(db: Db, customerId: number, id: number): Promise<boolean> {
  return (await db('customer_addresses').where({ id, customer_id: customerId }).delete()) === 1;
}
