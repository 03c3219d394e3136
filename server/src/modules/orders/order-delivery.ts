/** How an order travels, as both order pages show it: the repos give the order's columns, this adds the shop's words. */
import type { Db } from '../../db/knex.ts';
import type { OrderDelivery } from '../../contracts/shipping.ts';
import { shippingRatesOf } from '../settings/shipping-settings-service.ts';

/** Adds where and when to collect to a pick-up order, as the shop says it now (none while pick-up is not offered). */
export async function withPickupNote(db: Db, delivery: OrderDelivery): Promise<OrderDelivery> {
  if (delivery.method !== 'pickup') return delivery;
  const rates = await shippingRatesOf(db);
  return { ...delivery, pickupNote: rates?.pickup.isOffered && rates.pickup.note ? rates.pickup.note : null };
}
