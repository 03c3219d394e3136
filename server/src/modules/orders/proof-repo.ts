import type { Knex } from 'knex';
import type { Db } from '../../db/knex.ts';

export interface NewProof {
  orderId: number;
  source: string;
  imagePng: Buffer;
  message: string | null;
  sentByUserId: number;
  at: Date;
}

/** The next proof number of an order, inside the transaction that sends it. */
export async function nextProofVersion(trx: Knex.Transaction, orderId: number): Promise<number> {
  const latest = await trx('proofs').where({ order_id: orderId }).max({ version: 'version' }).first();
  return Number(latest?.version ?? 0) + 1;
}

/** Stores a sent proof; the one the customer had before is kept, marked superseded. */
export async function insertSentProof(trx: Knex.Transaction, version: number, proof: NewProof): Promise<void> {
  await trx('proofs')
    .where({ order_id: proof.orderId, status: 'sent' })
    .update({ status: 'superseded', updated_at: proof.at });
  await trx('proofs').insert({
    order_id: proof.orderId,
    version,
    status: 'sent',
    source: proof.source,
    image_png: proof.imagePng,
    message: proof.message,
    comment_pins: JSON.stringify([]),
    sent_by_user_id: proof.sentByUserId,
    created_at: proof.at,
    updated_at: proof.at,
  });
}

/** A proof's stored picture: undefined when there is no such proof, null when seeded history kept none. */
export async function findProofPicture(db: Db, number: string, version: number): Promise<Buffer | null | undefined> {
  const row = await db('proofs as p')
    .join('orders as o', 'o.id', 'p.order_id')
    .where({ 'o.number': number, 'p.version': version })
    .first('p.image_png');
  return row ? ((row.image_png as Buffer | null) ?? null) : undefined;
}
