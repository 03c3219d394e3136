import { proofVersionColumns, proofVersionOf } from './proof-repo.ts';
import type { ProofPrice } from '../../contracts/proof-versions.ts';
import type { Db } from '../../db/knex.ts';
import type { OrderStatus, PaymentStatus } from '../../contracts/order-status.ts';
import type { ShipTo } from '../../contracts/orders.ts';
import type { OrderDelivery } from '../../contracts/shipping.ts';
import type { QuoteLineShape } from '../../contracts/quotes.ts';
import { deliveryOfRow } from './order-shipment-repo.ts';

const iso = (value: Date | string | null): string | null => (value === null ? null : new Date(value).toISOString());
const dateOnly = (value: Date | string | null): string | null => (value === null ? null : iso(value)!.slice(0, 10));

export interface CustomerOrderRow {
  id: number;
  number: string;
  status: OrderStatus;
  paymentStatus: PaymentStatus;
  description: string;
  designName: string;
  garmentName: string;
  subtotalCents: number;
  shippingCents: number;
  taxCents: number;
  totalCents: number;
  currency: string;
  neededBy: string | null;
  createdAt: string;
  placedAt: string | null;
  shipTo: ShipTo;
  delivery: OrderDelivery;
  customerNote: string | null;
  quantity: number;
}

/** One entry of an order's history as stored; the wording turns it into the customer's timeline. */
export interface StoredOrderEvent {
  id: number;
  type: string;
  note: string | null;
  payload: Record<string, unknown> | null;
  createdAt: string;
}

/** The order columns with its one item, design and garment; every read names the customer. */
function ordersOf(db: Db, customerId: number) {
  return db('orders as o')
    .join('order_items as i', 'i.order_id', 'o.id')
    .join('designs as d', 'd.id', 'i.design_id')
    .join('garments as g', 'g.id', 'd.garment_id')
    .select('o.*', 'i.description', 'i.quantity', 'i.design_id', 'd.name as design_name', 'g.name as garment_name')
    .where('o.customer_id', customerId);
}

function toRow(row: Record<string, unknown>): CustomerOrderRow {
  return {
    id: row.id as number,
    number: row.number as string,
    status: row.status as OrderStatus,
    paymentStatus: row.payment_status as PaymentStatus,
    description: row.description as string,
    designName: row.design_name as string,
    garmentName: row.garment_name as string,
    subtotalCents: Number(row.subtotal_cents),
    shippingCents: Number(row.shipping_cents),
    taxCents: Number(row.tax_cents),
    totalCents: Number(row.total_cents),
    currency: row.currency as string,
    neededBy: dateOnly(row.needed_by as Date | null),
    createdAt: iso(row.created_at as Date)!,
    placedAt: iso(row.placed_at as Date | null),
    shipTo: row.ship_to as ShipTo,
    delivery: deliveryOfRow(row),
    customerNote: row.customer_note as string | null,
    quantity: row.quantity as number,
  };
}

/** The customer's orders, newest first; the first item of each (orders have one). */
export async function listCustomerOrders(db: Db, customerId: number): Promise<CustomerOrderRow[]> {
  const rows = await ordersOf(db, customerId).orderBy([
    { column: 'o.created_at', order: 'desc' },
    { column: 'o.id', order: 'desc' },
  ]);
  const seen = new Set<number>();
  return rows.filter((row) => !seen.has(row.id) && seen.add(row.id)).map(toRow);
}

/** Which of these orders have a proof waiting for the customer's answer. */
export async function ordersWithProofWaiting(db: Db, orderIds: number[]): Promise<Set<number>> {
  if (orderIds.length === 0) return new Set();
  const rows = await db('proofs').distinct('order_id').whereIn('order_id', orderIds).where({ status: 'sent' });
  return new Set(rows.map((row) => row.order_id as number));
}

export interface CustomerOrderDetailRows {
  order: CustomerOrderRow;
  quote: { ruleSetVersion: number; isRush: boolean; lines: QuoteLineShape[] };
  design: {
    id: number;
    name: string;
    garmentId: number;
    garmentSlug: string;
    garmentName: string;
    sizeId: number;
    sizeLabel: string;
    colourId: number;
    colourName: string;
    colourHex: string;
    document: unknown;
  };
  proofs: {
    version: number;
    status: 'sent' | 'approved' | 'changes_requested' | 'superseded';
    message: string | null;
    source: 'render' | 'photo';
    sentAt: string;
    respondedAt: string | null;
    customerComment: string | null;
    pins: { xPct: number; yPct: number; comment: string }[];
    hasImage: boolean;
    changes: string[];
    price: ProofPrice;
  }[];
  events: StoredOrderEvent[];
}

/** One of the customer's orders with its quote, design, proofs and history; undefined when it is not theirs. */
export async function readCustomerOrder(
  db: Db,
  customerId: number,
  number: string,
): Promise<CustomerOrderDetailRows | undefined> {
  const row = await ordersOf(db, customerId).where('o.number', number).orderBy('i.id').first();
  if (!row) return undefined;
  const [quote, design, proofs, events] = await Promise.all([
    db('quotes as q')
      .join('pricing_rule_sets as r', 'r.id', 'q.pricing_rule_set_id')
      .select('q.lines', 'q.is_rush', 'r.version')
      .where('q.id', row.quote_id)
      .first(),
    db('designs as d')
      .join('garments as g', 'g.id', 'd.garment_id')
      .join('garment_sizes as s', 's.id', 'd.garment_size_id')
      .join('fabric_colours as c', 'c.id', 'd.fabric_colour_id')
      .select(
        'd.id',
        'd.name',
        'd.document',
        'g.id as garment_id',
        'g.slug',
        'g.name as garment_name',
        's.id as size_id',
        's.label as size_label',
        'c.id as colour_id',
        'c.name as colour_name',
        'c.hex',
      )
      .where('d.id', row.design_id)
      .first(),
    db('proofs')
      .select(
        'version',
        'status',
        'message',
        'source',
        'created_at',
        'responded_at',
        'customer_comment',
        'comment_pins',
        ...proofVersionColumns,
        db.raw('image_png IS NOT NULL AS has_image'),
      )
      .where({ order_id: row.id })
      .orderBy('version'),
    db('order_events')
      .select('id', 'type', 'note', 'payload', 'created_at')
      .where({ order_id: row.id })
      .orderBy([{ column: 'created_at' }, { column: 'id' }]),
  ]);
  return {
    order: toRow(row),
    quote: { ruleSetVersion: quote.version, isRush: Boolean(quote.is_rush), lines: quote.lines },
    design: {
      id: design.id,
      name: design.name,
      garmentId: design.garment_id,
      garmentSlug: design.slug,
      garmentName: design.garment_name,
      sizeId: design.size_id,
      sizeLabel: design.size_label,
      colourId: design.colour_id,
      colourName: design.colour_name,
      colourHex: design.hex,
      document: design.document,
    },
    proofs: proofs.map((p) => ({
      version: p.version,
      status: p.status,
      message: p.message,
      source: p.source,
      sentAt: iso(p.created_at)!,
      respondedAt: iso(p.responded_at),
      customerComment: p.customer_comment,
      pins: p.comment_pins ?? [],
      hasImage: Boolean(p.has_image),
      ...proofVersionOf(p),
    })),
    events: events.map((e) => ({
      id: e.id,
      type: e.type,
      note: e.note,
      payload: e.payload,
      createdAt: iso(e.created_at)!,
    })),
  };
}

/** The proof picture of an order; `customerId` null lets the studio read any order's. */
export async function readProofImage(
  db: Db,
  number: string,
  version: number,
  customerId: number | null,
): Promise<Buffer | undefined> {
  const query = db('proofs as p')
    .join('orders as o', 'o.id', 'p.order_id')
    .select('p.image_png')
    .where({ 'o.number': number, 'p.version': version });
  if (customerId !== null) query.where('o.customer_id', customerId);
  const row = await query.first();
  return row?.image_png ?? undefined;
}

/** The order's latest proof, locked for an answer. */
export async function lockLatestProof(
  trx: Db,
  orderId: number,
): Promise<{ id: number; version: number; status: string } | undefined> {
  return trx('proofs')
    .select('id', 'version', 'status')
    .where({ order_id: orderId })
    .orderBy('version', 'desc')
    .forUpdate()
    .first();
}

export async function recordProofAnswer(
  trx: Db,
  proofId: number,
  answer: { status: 'approved' | 'changes_requested'; comment: string | null; pins: object[]; at: Date },
): Promise<void> {
  await trx('proofs')
    .where({ id: proofId })
    .update({
      status: answer.status,
      customer_comment: answer.comment,
      comment_pins: JSON.stringify(answer.pins),
      responded_at: answer.at,
      updated_at: answer.at,
    });
}
