import type { Db } from '../../db/knex.ts';
import type { DesignDocument } from '../../contracts/designs.ts';

/** A saved design as stored; the document is left unread (`unknown`) so that no caller can skip restoreDesign. */
export interface StoredDesign {
  id: number;
  name: string;
  garmentId: number;
  sizeId: number;
  colourId: number;
  document: unknown;
  shareToken: string | null;
  /** ISO 8601, UTC. */
  createdAt: string;
  updatedAt: string;
}

/** One customer's design: every read and write names both, so nobody reaches another person's design by id. */
export interface OwnedDesignKey {
  id: number;
  customerId: number;
}

/** What a save writes: the choices, the name and the checked document, stamped with the service's clock. */
export interface DesignWrite {
  garmentId: number;
  sizeId: number;
  colourId: number;
  name: string;
  document: DesignDocument;
  savedAt: Date;
}

export const storedColumns = [
  'id',
  'name',
  'garment_id',
  'garment_size_id',
  'fabric_colour_id',
  'document',
  'share_token',
  'created_at',
  'updated_at',
];

// mysql2 reads DATETIME as a Date (the pool runs in UTC) and JSON columns arrive parsed.
export function toStoredDesign(row: Record<string, unknown>): StoredDesign {
  return {
    id: row.id as number,
    name: row.name as string,
    garmentId: row.garment_id as number,
    sizeId: row.garment_size_id as number,
    colourId: row.fabric_colour_id as number,
    document: row.document,
    shareToken: (row.share_token as string | null) ?? null,
    createdAt: (row.created_at as Date).toISOString(),
    updatedAt: (row.updated_at as Date).toISOString(),
  };
}

/** The columns a save sets; mysql2 would write a plain object as `key = value` pairs, so the JSON is stringified. */
function columnsOf(write: DesignWrite) {
  return {
    garment_id: write.garmentId,
    garment_size_id: write.sizeId,
    fabric_colour_id: write.colourId,
    name: write.name,
    document: JSON.stringify(write.document),
    document_version: write.document.version,
    updated_at: write.savedAt,
  };
}

/** The customer's designs, the most recently changed first (designs_customer_list_index). */
export async function listCustomerDesigns(db: Db, customerId: number): Promise<StoredDesign[]> {
  const rows = await db('designs')
    .select(storedColumns)
    .where({ customer_id: customerId })
    .orderBy([
      { column: 'updated_at', order: 'desc' },
      { column: 'id', order: 'desc' },
    ]);
  return rows.map(toStoredDesign);
}

/** The design if it is this customer's; undefined both when it does not exist and when it is someone else's. */
export async function findOwnedDesign(db: Db, key: OwnedDesignKey): Promise<StoredDesign | undefined> {
  const row = await db('designs').select(storedColumns).where({ id: key.id, customer_id: key.customerId }).first();
  return row ? toStoredDesign(row) : undefined;
}

/** Saves a new design for the customer and gives its id. */
export async function insertDesign(db: Db, customerId: number, write: DesignWrite): Promise<number> {
  const [id] = await db('designs').insert({ customer_id: customerId, ...columnsOf(write), created_at: write.savedAt });
  return id as number;
}

/**
 * Replaces the customer's design; false when they have no such design. mysql2 connects with FOUND_ROWS, so the
 * count is of rows matched, and saving an unchanged design still reads as found.
 */
export async function updateOwnedDesign(db: Db, key: OwnedDesignKey, write: DesignWrite): Promise<boolean> {
  const matched = await db('designs').where({ id: key.id, customer_id: key.customerId }).update(columnsOf(write));
  return matched > 0;
}

/**
 * Locks the customer's design row until the transaction ends, so no order can take it up meanwhile (an order
 * item's foreign key check waits on this lock); false when they have no such design.
 */
export async function lockOwnedDesign(trx: Db, key: OwnedDesignKey): Promise<boolean> {
  const row = await trx('designs').select('id').where({ id: key.id, customer_id: key.customerId }).forUpdate().first();
  return row !== undefined;
}

/** The number of the first order that stitches this design, if any: orders keep their designs. */
export async function findOrderNumberOfDesign(db: Db, designId: number): Promise<string | undefined> {
  const row = await db('order_items as i')
    .join('orders as o', 'o.id', 'i.order_id')
    .select('o.number')
    .where('i.design_id', designId)
    .orderBy('o.id')
    .first();
  return row?.number;
}

/** Deletes a design; the caller has locked it and checked that no order holds it. */
export async function deleteDesign(trx: Db, designId: number): Promise<void> {
  await trx('designs').where({ id: designId }).delete();
}
