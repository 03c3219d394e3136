import type { Knex } from 'knex';
import type { Db } from '../../db/knex.ts';
import type { ProofPrice } from '../../contracts/proof-versions.ts';

export interface NewProof {
  orderId: number;
  source: string;
  imagePng: Buffer;
  message: string | null;
  sentByUserId: number;
  at: Date;
  /** The design the proof shows and the price it comes to, against the order's total when it was sent. */
  version: {
    document: object;
    lines: { code: string; label: string; amountCents: number }[];
    subtotalCents: number;
    taxCents: number;
    totalCents: number;
    previousTotalCents: number;
    changes: string[];
  };
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
    design_document: JSON.stringify(proof.version.document),
    price_lines: JSON.stringify(proof.version.lines),
    subtotal_cents: proof.version.subtotalCents,
    tax_cents: proof.version.taxCents,
    total_cents: proof.version.totalCents,
    previous_total_cents: proof.version.previousTotalCents,
    changes: JSON.stringify(proof.version.changes),
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

/** The price a proof carries, in the answering transaction; null for a proof sent before proofs carried one. */
export async function readProofPrice(
  trx: Knex.Transaction,
  proofId: number,
): Promise<{ subtotalCents: number; taxCents: number; totalCents: number } | null> {
  const row = await trx('proofs').where({ id: proofId }).first('subtotal_cents', 'tax_cents', 'total_cents');
  if (!row || row.total_cents === null) return null;
  return {
    subtotalCents: Number(row.subtotal_cents),
    taxCents: Number(row.tax_cents),
    totalCents: Number(row.total_cents),
  };
}

/** The columns a proof's version carries, for the order pages' reads. */
export const proofVersionColumns = ['changes', 'price_lines', 'total_cents', 'previous_total_cents'] as const;

const parsedJson = (value: unknown) => (typeof value === 'string' ? JSON.parse(value) : value);

/** What changed in a proof and the price it carries; seeded history carries neither. */
export function proofVersionOf(row: Record<string, unknown>): { changes: string[]; price: ProofPrice } {
  return {
    changes: (parsedJson(row.changes) as string[] | null) ?? [],
    price:
      row.total_cents === null || row.total_cents === undefined
        ? null
        : {
            previousTotalCents: Number(row.previous_total_cents),
            totalCents: Number(row.total_cents),
            lines: (parsedJson(row.price_lines) as NonNullable<ProofPrice>['lines'] | null) ?? [],
          },
  };
}

/** The design the latest proof showed, unparsed; null when no proof carried one. */
export async function latestProofDocument(db: Db, orderId: number): Promise<unknown> {
  const row = await db('proofs')
    .where({ order_id: orderId })
    .whereNotNull('design_document')
    .orderBy('version', 'desc')
    .first('design_document');
  return row ? parsedJson(row.design_document) : null;
}
