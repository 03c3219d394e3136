import type { ShippingMethod } from '../../contracts/shipping.ts';
import type { Db } from '../../db/knex.ts';
import type { OrderStatus, PaymentStatus } from '../../contracts/order-status.ts';
import type { ShipTo } from '../../contracts/orders.ts';

/** The first order number a new shop gives, and the letters before it (the shop's initials). */
const ORDER_NUMBER_PREFIX = 'WB';

export type PaymentRowStatus =
  'pending' | 'authorized' | 'saved' | 'captured' | 'partially_refunded' | 'refunded' | 'voided' | 'failed';

/** How a payment row takes money: a hold, a card kept for later, the studio's off-session charge, a payment link. */
export type PaymentMethodKind = 'hold' | 'saved_card' | 'off_session' | 'payment_link';

/** An order as checkout and the payment webhooks handle it. */
export interface OrderRecord {
  id: number;
  number: string;
  customerId: number;
  status: OrderStatus;
  paymentStatus: PaymentStatus;
  totalCents: number;
  currency: string;
}

export interface PaymentRecord {
  id: number;
  orderId: number;
  checkoutSessionId: string | null;
  paymentIntentId: string | null;
  status: PaymentRowStatus;
  authorizedCents: number;
  capturedCents: number;
  refundedCents: number;
  captureBefore: Date | null;
  method: PaymentMethodKind;
  providerCustomerId: string | null;
  paymentMethodId: string | null;
  paymentPageUrl: string | null;
}

const toOrder = (row: Record<string, unknown>): OrderRecord => ({
  id: row.id as number,
  number: row.number as string,
  customerId: row.customer_id as number,
  status: row.status as OrderStatus,
  paymentStatus: row.payment_status as PaymentStatus,
  totalCents: Number(row.total_cents),
  currency: row.currency as string,
});

const toPayment = (row: Record<string, unknown>): PaymentRecord => ({
  id: row.id as number,
  orderId: row.order_id as number,
  checkoutSessionId: row.checkout_session_id as string | null,
  paymentIntentId: row.payment_intent_id as string | null,
  status: row.status as PaymentRowStatus,
  authorizedCents: Number(row.amount_authorized_cents),
  capturedCents: Number(row.amount_captured_cents),
  refundedCents: Number(row.amount_refunded_cents),
  captureBefore: row.capture_before ? new Date(row.capture_before as string) : null,
  method: (row.method as PaymentMethodKind | undefined) ?? 'hold',
  providerCustomerId: (row.provider_customer_id as string | null) ?? null,
  paymentMethodId: (row.payment_method_id as string | null) ?? null,
  paymentPageUrl: (row.payment_page_url as string | null) ?? null,
});

const orderColumns = ['id', 'number', 'customer_id', 'status', 'payment_status', 'total_cents', 'currency'];

/** The next order number, WB-1001 onwards; the caller's transaction holds the lock until its order is in. */
/** The next order number from the `order_numbers` sequence (no lock; a rolled-back checkout leaves a gap). */
export async function nextOrderNumber(db: Db): Promise<string> {
  const [rows] = await db.raw('SELECT NEXTVAL(order_numbers) AS n');
  return `${ORDER_NUMBER_PREFIX}-${Number((rows as { n: number | string }[])[0]!.n)}`;
}

/**
 * The key that makes placing an order idempotent: one order per stored quote and saved design (a unique index on
 * `orders.placement_key`).
 */
export const orderPlacementKey = (quoteId: number, designId: number) => `quote-${quoteId}-design-${designId}`;

export interface OrderWrite {
  number: string;
  customerId: number;
  quoteId: number;
  subtotalCents: number;
  shippingCents: number;
  shippingMethod: ShippingMethod;
  taxCents: number;
  totalCents: number;
  currency: string;
  neededBy: string;
  shipTo: ShipTo;
  note: string | null;
  item: { designId: number; sizeId: number; quantity: number; description: string };
  createdAt: Date;
}

const isDuplicatePlacement = (error: unknown) =>
  (error as { code?: string }).code === 'ER_DUP_ENTRY' && String(error).includes('orders_placement_key_unique');

/**
 * Writes the order awaiting payment with its one item and its created event; gives the order id, or undefined when
 * an order for the same quote and design is already there (its placement key is taken).
 */
export async function insertOrder(trx: Db, write: OrderWrite): Promise<number | undefined> {
  const stamps = { created_at: write.createdAt, updated_at: write.createdAt };
  const inserted = await trx('orders')
    .insert({
      number: write.number,
      placement_key: orderPlacementKey(write.quoteId, write.item.designId),
      customer_id: write.customerId,
      quote_id: write.quoteId,
      status: 'awaiting_payment',
      payment_status: 'none',
      subtotal_cents: write.subtotalCents,
      shipping_cents: write.shippingCents,
      shipping_method: write.shippingMethod,
      tax_cents: write.taxCents,
      total_cents: write.totalCents,
      currency: write.currency,
      needed_by: write.neededBy,
      ship_to: JSON.stringify(write.shipTo),
      customer_note: write.note,
      placed_at: null,
      ...stamps,
    })
    .catch((error: unknown) => {
      if (isDuplicatePlacement(error)) return undefined;
      throw error;
    });
  if (!inserted) return undefined;
  const [orderId] = inserted;
  // One line: the quote priced one design on identical garments. The unit price is the pre-tax amount shared over
  // the garments; a one-off setup makes it inexact, so total_cents is the figure.
  await trx('order_items').insert({
    order_id: orderId,
    design_id: write.item.designId,
    garment_size_id: write.item.sizeId,
    quantity: write.item.quantity,
    unit_price_cents: Math.round(write.subtotalCents / write.item.quantity),
    total_cents: write.subtotalCents,
    description: write.item.description,
    ...stamps,
  });
  await trx('order_events').insert({
    order_id: orderId,
    actor_user_id: write.customerId,
    type: 'order_created',
    from_status: null,
    to_status: 'awaiting_payment',
    created_at: write.createdAt,
  });
  return orderId as number;
}

/** The customer's order by number; undefined when it is missing or someone else's. */
export async function findCustomerOrder(db: Db, customerId: number, number: string): Promise<OrderRecord | undefined> {
  const row = await db('orders').select(orderColumns).where({ number, customer_id: customerId }).first();
  return row ? toOrder(row) : undefined;
}

/** The customer's order placed from this quote and design, if there is one. */
export async function findPlacedOrder(
  db: Db,
  customerId: number,
  placement: { quoteId: number; designId: number },
): Promise<OrderRecord | undefined> {
  const row = await db('orders')
    .select(orderColumns)
    .where({ customer_id: customerId, placement_key: orderPlacementKey(placement.quoteId, placement.designId) })
    .first();
  return row ? toOrder(row) : undefined;
}

export async function findOrderById(db: Db, id: number): Promise<OrderRecord | undefined> {
  const row = await db('orders').select(orderColumns).where({ id }).first();
  return row ? toOrder(row) : undefined;
}

/** A new checkout attempt for the order, pending until the card is held. */
export async function insertPendingPayment(
  trx: Db,
  order: Pick<OrderRecord, 'id' | 'currency'>,
  now: Date,
  extra: { method?: PaymentMethodKind; amount_authorized_cents?: number; provider_customer_id?: string } = {},
): Promise<number> {
  const [id] = await trx('payments').insert({
    ...extra,
    order_id: order.id,
    status: 'pending',
    currency: order.currency,
    created_at: now,
    updated_at: now,
  });
  return id as number;
}

export async function listPayments(db: Db, orderId: number): Promise<PaymentRecord[]> {
  const rows = await db('payments').select('*').where({ order_id: orderId }).orderBy('id');
  return rows.map(toPayment);
}

/** The payment by the provider's ids, locked for the caller's transaction. */
export async function lockPaymentBy(
  trx: Db,
  key: { checkoutSessionId: string } | { paymentIntentId: string },
): Promise<PaymentRecord | undefined> {
  const where =
    'checkoutSessionId' in key
      ? { checkout_session_id: key.checkoutSessionId }
      : { payment_intent_id: key.paymentIntentId };
  // An event without the id it should carry matches no payment.
  if (typeof Object.values(where)[0] !== 'string') return undefined;
  const row = await trx('payments').select('*').where(where).forUpdate().first();
  return row ? toPayment(row) : undefined;
}

/** The order's latest checkout attempt still waiting for a card, locked. */
export async function lockLatestPendingPayment(trx: Db, orderId: number): Promise<PaymentRecord | undefined> {
  const row = await trx('payments')
    .select('*')
    .where({ order_id: orderId, status: 'pending' })
    .orderBy('id', 'desc')
    .forUpdate()
    .first();
  return row ? toPayment(row) : undefined;
}

export async function updatePayment(db: Db, id: number, changes: Record<string, unknown>, now: Date): Promise<void> {
  await db('payments')
    .where({ id })
    .update({ ...changes, updated_at: now });
}

/**
 * The order's payment status follows its payments: the latest one that got as far as the card (pending and
 * failed attempts leave it as it was).
 */
export async function syncOrderPaymentStatus(trx: Db, orderId: number, now: Date): Promise<void> {
  const latest = await trx('payments')
    .select('status')
    .where({ order_id: orderId })
    .whereNotIn('status', ['pending', 'failed'])
    .orderBy('id', 'desc')
    .first();
  await trx('orders')
    .where({ id: orderId })
    .update({ payment_status: latest?.status ?? 'none', updated_at: now });
}

/** An order event that is not a status move: a payment attempt, a hold released, a new hold. */
export async function insertOrderNote(
  trx: Db,
  event: {
    orderId: number;
    type: string;
    actorUserId: number | null;
    note?: string | null;
    payload?: object;
    at: Date;
  },
): Promise<void> {
  await trx('order_events').insert({
    order_id: event.orderId,
    actor_user_id: event.actorUserId,
    type: event.type,
    note: event.note ?? null,
    payload: event.payload ? JSON.stringify(event.payload) : null,
    created_at: event.at,
  });
}

/** How an order line names its design: "Clara's bishop: Bishop dress, 6 months, Christening White". */
export async function describeDesignForOrder(
  db: Db,
  design: { name: string; garmentId: number; sizeId: number; colourId: number },
): Promise<string> {
  const row = await db('garments as g')
    .join('garment_sizes as s', 's.garment_id', 'g.id')
    .join('fabric_colours as c', 'c.garment_id', 'g.id')
    .select('g.name as garment_name', 's.label as size_label', 'c.name as colour_name')
    .where({ 'g.id': design.garmentId, 's.id': design.sizeId, 'c.id': design.colourId })
    .first();
  return row ? `${design.name}: ${row.garment_name}, ${row.size_label}, ${row.colour_name}` : design.name;
}

/** The order's line as the customer saw it at checkout. */
export async function readOrderDescription(db: Db, orderId: number): Promise<string | undefined> {
  const row = await db('order_items').select('description').where({ order_id: orderId }).orderBy('id').first();
  return row?.description;
}

/** Where the order's e-mails go. */
/** The date the customer asked for, YYYY-MM-DD, or null. */
export async function findOrderNeededBy(db: Db, orderId: number): Promise<string | null> {
  const row = await db('orders').select('needed_by').where({ id: orderId }).first();
  return row?.needed_by ? new Date(row.needed_by).toISOString().slice(0, 10) : null;
}

export async function findCustomerEmail(db: Db, orderId: number): Promise<string> {
  const row = await db('orders as o')
    .join('users as u', 'u.id', 'o.customer_id')
    .select('u.email')
    .where('o.id', orderId)
    .first();
  if (!row) throw new Error(`Order ${orderId} has no customer.`);
  return row.email;
}
