import { z } from 'zod';
import { guidanceMessage } from './guidance.ts';
import { orderStatus, paymentStatus } from './order-status.ts';
import { orderDelivery, shownAddress } from './shipping.ts';
import { proofPrice } from './proof-versions.ts';

export const orderNumberParams = z.object({
  number: z.string().regex(/^[A-Z]{2}-\d{1,10}$/, 'must look like WB-1001'),
});

export { paymentStatus };

export const orderEvent = z.object({
  id: z.number().int(),
  type: z.string(),
  fromStatus: orderStatus.nullable(),
  toStatus: orderStatus.nullable(),
  note: z.string().nullable(),
  actorName: z.string().nullable(),
  createdAt: z.string(),
});

export const orderDetailResponse = z.object({
  order: z.object({
    id: z.number().int(),
    number: z.string(),
    status: orderStatus,
    paymentStatus,
    customer: z.object({ name: z.string(), email: z.string() }),
    neededBy: z.string().nullable(),
    placedAt: z.string().nullable(),
    customerNote: z.string().nullable(),
    subtotalCents: z.number().int(),
    shippingCents: z.number().int(),
    taxCents: z.number().int(),
    totalCents: z.number().int(),
    currency: z.string(),
    delivery: orderDelivery,
    /** Where the parcel goes (for pick-up, the customer's address). */
    shipTo: shownAddress,
  }),
  items: z.array(
    z.object({
      id: z.number().int(),
      description: z.string(),
      quantity: z.number().int(),
      totalCents: z.number().int(),
      designName: z.string(),
      /** The customer's own pictures on the design, for the studio to digitize: where each is and its picture's address. */
      artwork: z.array(
        z.object({
          uploadId: z.number().int(),
          zone: z.string(),
          /** The place's name on this size, for people to read; `zone` is its code. */
          zoneLabel: z.string(),
          widthMm: z.number(),
          imageUrl: z.string(),
        }),
      ),
    }),
  ),
  quote: z.object({
    ruleSetVersion: z.number().int(),
    lines: z.array(z.object({ code: z.string(), label: z.string(), amountCents: z.number().int() })),
  }),
  payments: z.array(
    z.object({
      status: z.string(),
      authorizedCents: z.number().int(),
      capturedCents: z.number().int(),
      refundedCents: z.number().int(),
      captureBefore: z.string().nullable(),
      /** hold, saved_card (kept for later, nothing held), off_session (the studio's charge of it) or payment_link. */
      method: z.string(),
      /** Whether the card is kept at the provider for a later charge without the customer. */
      isCardKept: z.boolean(),
    }),
  ),
  /** What the studio's charge button does now, for the order's current total; null once charged or before a card. */
  charge: z
    .object({
      kind: z.enum(['capture', 'capture_less', 'charge_saved_card', 'ask_customer']),
      amountCents: z.number().int(),
      /** In plain words for the studio. */
      summary: z.string(),
    })
    .nullable(),
  proofs: z.array(
    z.object({
      version: z.number().int(),
      status: z.string(),
      message: z.string().nullable(),
      sentAt: z.string(),
      respondedAt: z.string().nullable(),
      source: z.enum(['render', 'photo']),
      customerComment: z.string().nullable(),
      /** The customer's pointers on the picture, positions in % of its width and height. */
      commentPins: z.array(z.object({ xPct: z.number(), yPct: z.number(), comment: z.string() })),
      /** Null when no picture was kept (seeded history). */
      imageUrl: z.string().nullable(),
      /** What changed since the version before, in words. */
      changes: z.array(z.string()),
      /** The price this version carries against the order's total when it was sent. */
      price: proofPrice,
    }),
  ),
  /** What the studio can do to the order now, by the state machine: the order page shows a button for each. */
  studioActions: z.array(z.enum(['send_proof', 'start_production', 'mark_stitched', 'ship', 'cancel', 'refund'])),
  events: z.array(orderEvent),
  /** Where two placements of the design would be stitched over each other, to check before sending a proof. */
  layoutNotes: z.array(guidanceMessage).optional(),
});
export type OrderDetailResponse = z.infer<typeof orderDetailResponse>;

/** Where the studio opens a customer's uploaded picture that an order stitches. */
export const orderArtworkImagePath = (number: string, uploadId: number) =>
  `/api/admin/orders/${encodeURIComponent(number)}/artwork/${uploadId}/image`;

export const orderArtworkParams = z.object({
  number: orderNumberParams.shape.number,
  uploadId: z
    .string()
    .regex(/^[1-9]\d{0,9}$/, 'must be an upload number')
    .transform(Number),
});
