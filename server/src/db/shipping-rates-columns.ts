import type { ShippingRates } from '../engine/index.ts';

/** The shop_settings columns that hold the shop's shipping methods and rates, for every repo that reads them. */
export const SHIPPING_RATE_COLUMNS = [
  'delivery_is_offered',
  'delivery_flat_cents',
  'delivery_free_from_cents',
  'pickup_is_offered',
  'pickup_note',
] as const;

type ShippingRateRow = Record<(typeof SHIPPING_RATE_COLUMNS)[number], unknown>;

/** The columns as the engine takes them; mysql2 gives booleans as 0/1. */
export function shippingRatesOfRow(row: ShippingRateRow): ShippingRates {
  return {
    delivery: {
      isOffered: Boolean(row.delivery_is_offered),
      flatCents: Number(row.delivery_flat_cents),
      freeFromCents: row.delivery_free_from_cents === null ? null : Number(row.delivery_free_from_cents),
    },
    pickup: { isOffered: Boolean(row.pickup_is_offered), note: String(row.pickup_note ?? '') },
  };
}

/** The rates as columns, for the settings update. */
export function shippingRateColumns(rates: ShippingRates): ShippingRateRow {
  return {
    delivery_is_offered: rates.delivery.isOffered,
    delivery_flat_cents: rates.delivery.flatCents,
    delivery_free_from_cents: rates.delivery.freeFromCents,
    pickup_is_offered: rates.pickup.isOffered,
    pickup_note: rates.pickup.note,
  };
}
