import { z } from 'zod';

/** How the parcel reaches the customer. */
export const shippingMethod = z.enum(['delivery', 'pickup'], { error: 'Choose delivery or pick-up' });
export type ShippingMethod = z.infer<typeof shippingMethod>;

/** Most a flat delivery charge or free-delivery amount may be, in cents: past it is a typing slip. */
const MAX_SHIPPING_CENTS = 1_000_000;

const cents = (what: string) =>
  z
    .number({ error: `Enter ${what}` })
    .int(`Enter ${what} in whole cents`)
    .min(0, `${what[0].toUpperCase()}${what.slice(1)} can't be negative`)
    .max(MAX_SHIPPING_CENTS, `Keep ${what} under 10,000.00`);

/** The shop's ways of getting an order to the customer and what they cost; the owner edits them. */
export const shippingSettings = z
  .object({
    delivery: z.object({
      isOffered: z.boolean({ error: 'Say whether the shop delivers' }),
      /** One charge per order. */
      flatCents: cents('the delivery charge'),
      /** Orders whose goods come to this or more ship free; null: never free. */
      freeFromCents: cents('the free-delivery amount').nullable(),
    }),
    pickup: z.object({
      isOffered: z.boolean({ error: 'Say whether customers may pick up' }),
      /** Where and when to collect, shown at checkout and on the order. */
      note: z.string().trim().max(300, 'Keep the pick-up note to 300 characters'),
    }),
  })
  .refine((settings) => settings.delivery.isOffered || settings.pickup.isOffered, {
    message: 'Offer delivery, pick-up or both, or nobody can order',
    path: ['delivery', 'isOffered'],
  })
  .refine((settings) => !settings.pickup.isOffered || settings.pickup.note.length > 0, {
    message: 'Say where and when customers pick up',
    path: ['pickup', 'note'],
  });
export type ShippingSettings = z.infer<typeof shippingSettings>;

export const shippingSettingsResponse = z.object({ settings: shippingSettings, canEdit: z.boolean() });
export type ShippingSettingsResponse = z.infer<typeof shippingSettingsResponse>;

/** One way the shop offers, priced for the quote it comes with. */
export const shippingOption = z.object({
  method: shippingMethod,
  name: z.string(),
  cents: z.number().int(),
});

/** The quote's shipping: the method on its shipping line, every method offered, and what the shop says of them. */
export const quoteShipping = z.object({
  method: shippingMethod,
  options: z.array(shippingOption),
  /** Orders whose goods reach this ship free; null when delivery is never free or not offered. */
  freeDeliveryFromCents: z.number().int().nullable(),
  /** Where and when to collect; null without pick-up. */
  pickupNote: z.string().nullable(),
});
export type QuoteShipping = z.infer<typeof quoteShipping>;

/** An order's address as the pages show it (the checkout's `shipTo`, already checked). */
export const shownAddress = z.object({
  name: z.string(),
  line1: z.string(),
  line2: z.string().optional(),
  city: z.string(),
  region: z.string(),
  postalCode: z.string(),
  countryCode: z.string(),
  phone: z.string().optional(),
});

/** How an order travels, as both order pages show it: the method, and once posted, the carrier and tracking number. */
export const orderDelivery = z.object({
  method: shippingMethod,
  /** Set when the studio marked the order shipped with them. */
  carrier: z.string().nullable(),
  trackingNumber: z.string().nullable(),
  /** Where and when to collect, for a pick-up order while the shop offers pick-up; null otherwise. */
  pickupNote: z.string().nullable(),
});
export type OrderDelivery = z.infer<typeof orderDelivery>;
