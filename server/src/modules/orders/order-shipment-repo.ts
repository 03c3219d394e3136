import type { Db } from '../../db/knex.ts';
import type { OrderDelivery, ShippingMethod } from '../../contracts/shipping.ts';

/** The way the order was priced to travel; `trx` is the caller's transaction. */
export async function readShippingMethod(trx: Db, orderId: number): Promise<ShippingMethod> {
  const row = await trx('orders').select('shipping_method').where({ id: orderId }).first();
  return (row?.shipping_method as ShippingMethod | undefined) ?? 'delivery';
}

/** Keeps the parcel's carrier and tracking number on the order, for both order pages and the e-mail. */
export async function recordShipment(
  trx: Db,
  orderId: number,
  shipment: { carrier: string | null; trackingNumber: string | null },
  now: Date,
): Promise<void> {
  await trx('orders')
    .where({ id: orderId })
    .update({ shipping_carrier: shipment.carrier, tracking_number: shipment.trackingNumber, updated_at: now });
}

/** The order's delivery columns as the pages take them, before the shop's pick-up note is added. */
export function deliveryOfRow(row: Record<string, unknown>): OrderDelivery {
  return {
    method: (row.shipping_method as OrderDelivery['method'] | undefined) ?? 'delivery',
    carrier: (row.shipping_carrier as string | null | undefined) ?? null,
    trackingNumber: (row.tracking_number as string | null | undefined) ?? null,
    pickupNote: null,
  };
}
