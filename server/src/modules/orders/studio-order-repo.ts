import type { Knex } from 'knex';
import type { Db } from '../../db/knex.ts';
import type { OrderStatus, PaymentStatus } from '../../contracts/order-status.ts';
import type { OrderActionResponse } from '../../contracts/studio-orders.ts';

/** What the studio's actions need to know about an order before they act on it. */
export interface StudioOrder {
  id: number;
  number: string;
  status: OrderStatus;
  paymentStatus: PaymentStatus;
  customerName: string;
  customerEmail: string;
  totalCents: number;
  currency: string;
  /** The studio's name, which signs the e-mails the action sends. */
  shopName: string;
}

/** The card payment of an order: the authorization checkout made, and what has been charged and given back. */
export interface OrderPayment {
  id: number;
  paymentIntentId: string | null;
  status: 'pending' | 'authorized' | 'saved' | 'captured' | 'partially_refunded' | 'refunded' | 'voided' | 'failed';
  authorizedCents: number;
  capturedCents: number;
  refundedCents: number;
  captureBefore: Date | null;
  /** The card kept at the provider for a later off-session charge, when checkout saved it. */
  keptCard: { customerId: string; paymentMethodId: string } | null;
}

export async function findStudioOrder(
  db: Db | Knex.Transaction,
  number: string,
  options: { lock?: boolean } = {},
): Promise<StudioOrder | undefined> {
  const query = db('orders as o')
    .join('users as u', 'u.id', 'o.customer_id')
    // The single settings row (id 1) names the studio.
    .join('shop_settings as s', 's.id', db.raw('1'))
    .where('o.number', number)
    .first(
      'o.id',
      'o.number',
      'o.status',
      'o.payment_status',
      'o.total_cents',
      'o.currency',
      'u.name as customer_name',
      'u.email as customer_email',
      's.name as shop_name',
    );
  // Locks the order row (and the customer's, which nothing else writes in these flows).
  if (options.lock) query.forUpdate();
  const row = await query;
  if (!row) return undefined;
  return {
    id: row.id,
    number: row.number,
    status: row.status,
    paymentStatus: row.payment_status,
    customerName: row.customer_name,
    customerEmail: row.customer_email,
    totalCents: Number(row.total_cents),
    currency: row.currency,
    shopName: row.shop_name,
  };
}

/**
 * The order's payment that holds or took money, newest first, locked with the order: an order has at most one
 * such payment (a lapsed or failed attempt is voided or failed, and paying again makes a new row).
 */
export async function lockLivePayment(trx: Knex.Transaction, orderId: number): Promise<OrderPayment | undefined> {
  const row = await trx('payments')
    .where({ order_id: orderId })
    .whereIn('status', ['authorized', 'saved', 'captured', 'partially_refunded', 'refunded'])
    .orderBy('id', 'desc')
    .forUpdate()
    .first();
  if (!row) return undefined;
  return {
    id: row.id,
    paymentIntentId: row.payment_intent_id,
    status: row.status,
    authorizedCents: Number(row.amount_authorized_cents),
    capturedCents: Number(row.amount_captured_cents),
    refundedCents: Number(row.amount_refunded_cents),
    captureBefore: row.capture_before === null ? null : new Date(row.capture_before),
    keptCard:
      row.provider_customer_id && row.payment_method_id
        ? { customerId: row.provider_customer_id, paymentMethodId: row.payment_method_id }
        : null,
  };
}

/** Sets the payment row's status and amounts and mirrors the status on the order, as the board reads it there. */
export async function updatePayment(
  trx: Knex.Transaction,
  orderId: number,
  paymentId: number,
  changes: {
    status: PaymentStatus;
    authorizedCents?: number;
    capturedCents?: number;
    refundedCents?: number;
    capturedAt?: Date;
  },
): Promise<void> {
  await trx('payments')
    .where({ id: paymentId })
    .update({
      status: changes.status,
      ...(changes.authorizedCents !== undefined && { amount_authorized_cents: changes.authorizedCents }),
      ...(changes.capturedCents !== undefined && { amount_captured_cents: changes.capturedCents }),
      ...(changes.refundedCents !== undefined && { amount_refunded_cents: changes.refundedCents }),
      ...(changes.capturedAt && { captured_at: changes.capturedAt }),
    });
  await trx('orders').where({ id: orderId }).update({ payment_status: changes.status });
}

/** An order event that records what happened without moving the order (a lapsed hold, a partial refund). */
export async function recordOrderEvent(
  trx: Knex.Transaction,
  event: {
    orderId: number;
    type: string;
    actorUserId: number | null;
    note?: string | null;
    payload?: object;
    now: Date;
  },
): Promise<void> {
  await trx('order_events').insert({
    order_id: event.orderId,
    actor_user_id: event.actorUserId,
    type: event.type,
    from_status: null,
    to_status: null,
    note: event.note ?? null,
    payload: event.payload ? JSON.stringify(event.payload) : null,
    created_at: event.now,
  });
}

/** Where the order stands after an action, read inside the action's transaction. */
export async function readOrderStanding(trx: Knex.Transaction | Db, orderId: number): Promise<OrderActionResponse> {
  const order = await trx('orders').where({ id: orderId }).first('number', 'status', 'payment_status');
  const payment = await trx('payments')
    .where({ order_id: orderId })
    .orderBy('id', 'desc')
    .first('amount_captured_cents', 'amount_refunded_cents');
  return {
    number: order.number,
    status: order.status,
    paymentStatus: order.payment_status,
    capturedCents: Number(payment?.amount_captured_cents ?? 0),
    refundedCents: Number(payment?.amount_refunded_cents ?? 0),
  };
}
