import type { ShippingMethod } from '../../contracts/shipping.ts';
import type { Knex } from 'knex';
import type { Db } from '../../db/knex.ts';
import type { OrderStatus } from '../../contracts/order-status.ts';

const parsed = (value: unknown) => (typeof value === 'string' ? JSON.parse(value) : value);

/** What re-pricing an order's design needs: the garment it is on, the quantity, and the design as last sent. */
export interface OrderPricingContext {
  id: number;
  number: string;
  status: OrderStatus;
  customerId: number;
  currency: string;
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  /** How the order reaches the customer, priced again with the design (null on orders from before shipping). */
  shippingMethod: ShippingMethod | null;
  garmentId: number;
  sizeId: number;
  colourId: number;
  quantity: number;
  isRush: boolean;
  /** The design as ordered (unparsed); the latest proof's own design wins when it has one. */
  orderedDocument: unknown;
  latestProof: { version: number; document: unknown } | null;
  /** The size's places on the garment, `[{ code, label }]`. */
  zones: { code: string; label: string }[];
  /** The garment drawing and its scale at this size, for the mockup's millimetres. */
  mockup: { garmentSlug: string; svg: string; scale: number };
}

/** One order's pricing context by its number; undefined when there is no such order. */
export async function readOrderPricingContext(db: Db, number: string): Promise<OrderPricingContext | undefined> {
  const row = await db('orders as o')
    .join('quotes as q', 'q.id', 'o.quote_id')
    .join('order_items as i', 'i.order_id', 'o.id')
    .join('designs as d', 'd.id', 'i.design_id')
    .join('garment_sizes as s', 's.id', 'i.garment_size_id')
    .join('garments as g', 'g.id', 'd.garment_id')
    .where('o.number', number)
    .orderBy('i.id')
    .first(
      'o.id',
      'o.number',
      'o.status',
      'o.customer_id',
      'o.currency',
      'o.subtotal_cents',
      'o.tax_cents',
      'o.total_cents',
      'o.shipping_method',
      'd.garment_id',
      'i.garment_size_id',
      'd.fabric_colour_id',
      'i.quantity',
      'q.is_rush',
      'd.document',
      's.placement_zones',
      's.mockup_scale',
      'g.slug as garment_slug',
      'g.mockup_svg',
    );
  if (!row) return undefined;
  const proof = await db('proofs')
    .where({ order_id: row.id })
    .orderBy('version', 'desc')
    .first('version', 'design_document');
  return {
    id: row.id,
    number: row.number,
    status: row.status,
    customerId: row.customer_id,
    currency: row.currency,
    subtotalCents: Number(row.subtotal_cents),
    taxCents: Number(row.tax_cents),
    totalCents: Number(row.total_cents),
    shippingMethod: row.shipping_method ?? null,
    garmentId: row.garment_id,
    sizeId: row.garment_size_id,
    colourId: row.fabric_colour_id,
    quantity: row.quantity,
    isRush: Boolean(row.is_rush),
    orderedDocument: parsed(row.document),
    latestProof: proof ? { version: proof.version, document: parsed(proof.design_document) ?? null } : null,
    zones: parsed(row.placement_zones) ?? [],
    mockup: { garmentSlug: row.garment_slug, svg: row.mockup_svg, scale: Number(row.mockup_scale) },
  };
}

/** The catalogue's names for the codes a design holds, retired rows included, for the changes in words. */
export async function readDesignNames(
  db: Db,
  codes: { threads: string[]; fonts: string[]; motifs: string[] },
): Promise<{ threads: Map<string, string>; fonts: Map<string, string>; motifs: Map<string, string> }> {
  const [threads, fonts, motifs] = await Promise.all([
    db('threads').whereIn('code', codes.threads).select('code', 'name'),
    db('lettering_fonts').whereIn('slug', codes.fonts).select('slug', 'name'),
    db('motifs').whereIn('slug', codes.motifs).select('slug', 'name'),
  ]);
  return {
    threads: new Map(threads.map((t) => [t.code, t.name])),
    fonts: new Map(fonts.map((f) => [f.slug, f.name])),
    motifs: new Map(motifs.map((m) => [m.slug, m.name])),
  };
}

/** The order's price of record and its line's, in the caller's transaction (the order row is already locked). */
export async function writeOrderTotals(
  trx: Knex.Transaction,
  orderId: number,
  totals: { subtotalCents: number; taxCents: number; totalCents: number },
): Promise<void> {
  await trx('orders')
    .where({ id: orderId })
    .update({
      subtotal_cents: totals.subtotalCents,
      // Shipping is what the total holds beyond the goods and their tax (free delivery may start or stop).
      shipping_cents: totals.totalCents - totals.subtotalCents - totals.taxCents,
      tax_cents: totals.taxCents,
      total_cents: totals.totalCents,
    });
  // An order is one design on identical garments: its line carries the subtotal, as checkout wrote it.
  const items = await trx('order_items').where({ order_id: orderId }).select('id', 'quantity');
  for (const item of items)
    await trx('order_items')
      .where({ id: item.id })
      .update({
        unit_price_cents: Math.round(totals.subtotalCents / item.quantity / items.length),
        total_cents: Math.round(totals.subtotalCents / items.length),
      });
}

/** The order's total now, inside the caller's transaction. */
export async function readOrderTotal(trx: Knex.Transaction, orderId: number): Promise<number> {
  const row = await trx('orders').where({ id: orderId }).first('total_cents');
  return Number(row.total_cents);
}
