import type { Db } from '../../db/knex.ts';

/* The cards an order keeps at the payment provider for charges made without the customer (off-session). */

/** The customer at the payment provider an earlier attempt of this order used, so its cards stay together. */
export async function findProviderCustomer(db: Db, orderId: number): Promise<string | null> {
  const row = await db('payments')
    .where({ order_id: orderId })
    .whereNotNull('provider_customer_id')
    .orderBy('id', 'desc')
    .first('provider_customer_id');
  return row?.provider_customer_id ?? null;
}

/** The card the order keeps at the provider for a later charge (the latest one checkout saved), if any. */
export async function findKeptCard(
  db: Db,
  orderId: number,
): Promise<{ paymentId: number; customerId: string; paymentMethodId: string } | undefined> {
  const row = await db('payments')
    .where({ order_id: orderId })
    .whereIn('method', ['hold', 'saved_card', 'payment_link'])
    .whereNotNull('provider_customer_id')
    .whereNotNull('payment_method_id')
    .orderBy('id', 'desc')
    .first('id', 'provider_customer_id', 'payment_method_id');
  return row
    ? { paymentId: row.id, customerId: row.provider_customer_id, paymentMethodId: row.payment_method_id }
    : undefined;
}

/** The bank will not let this card be charged without the customer: it is no longer kept for later charges. */
export async function forgetKeptCard(db: Db, orderId: number, paymentMethodId: string): Promise<void> {
  await db('payments')
    .where({ order_id: orderId, payment_method_id: paymentMethodId })
    .update({ payment_method_id: null });
}
