import { z } from 'zod';
import { designDocument } from './designs.ts';
import { proofPrice } from './proof-versions.ts';
import { designUploadPicture } from './artwork.ts';
import { orderStatus, paymentStatus } from './order-status.ts';
import { guidanceMessage } from './guidance.ts';
import { calendarDate } from './calendar-date.ts';
import { quoteLine } from './quotes.ts';
import { orderDelivery, shippingMethod, shownAddress } from './shipping.ts';

/** Most pins a customer may drop on one proof: more is a conversation for e-mail. */
export const MAX_PROOF_PINS = 20;
const MAX_PIN_COMMENT = 300;
const MAX_PROOF_COMMENT = 2000;
const MAX_ORDER_NOTE = 1000;

const text = (label: string, max: number) =>
  z
    .string({ error: `Enter ${label}` })
    .trim()
    .min(1, `Enter ${label}`)
    .max(max, `Keep ${label} to ${max} characters`);
const optionalText = (label: string, max: number) =>
  z
    .string()
    .trim()
    .max(max, `Keep ${label} to ${max} characters`)
    .optional()
    .transform((value) => (value === '' ? undefined : value));

/** Where the parcel goes. Country as an ISO 3166-1 alpha-2 code (US, CA, GB…). */
export const shipTo = z.strictObject({
  name: text('the name of the person receiving it', 100),
  line1: text('the street address', 120),
  line2: optionalText('the second address line', 120),
  city: text('the town or city', 80),
  region: text('the state, county or region', 80),
  postalCode: z
    .string({ error: 'Enter the postal code' })
    .trim()
    .min(2, 'Enter the postal code')
    .max(12, 'Keep the postal code to 12 characters')
    .regex(/^[A-Za-z0-9][A-Za-z0-9 -]*$/, 'Use letters, digits, spaces or “-”'),
  countryCode: z
    .string({ error: 'Choose the country' })
    .trim()
    .transform((value) => value.toUpperCase())
    .pipe(z.string().regex(/^[A-Z]{2}$/, 'Choose the country')),
  phone: z
    .string()
    .trim()
    .max(30, 'Keep the phone number to 30 characters')
    .regex(/^[0-9 +().-]*$/, 'Use digits, spaces and + ( ) - only')
    .optional()
    .transform((value) => (value === '' ? undefined : value)),
});
export type ShipTo = z.infer<typeof shipTo>;

/** The day the customer needs the order by. */
const neededByDate = calendarDate({ format: 'Choose the date you need it by', unreal: 'Choose a real date' });

const positiveId = (message: string) => z.number({ error: message }).int(message).positive(message);

/** Placing an order from a stored quote; every figure comes from the quote on the server. */
export const placeOrderRequest = z.strictObject({
  quoteId: positiveId('Price your design again before ordering'),
  designId: positiveId('Choose one of your saved designs'),
  neededBy: neededByDate,
  shipTo,
  /**
   * How the parcel reaches the customer; the quote must have been priced with it, and the shop must still offer it
   * (422 otherwise). Without it, the quote's own method.
   */
  shippingMethod: shippingMethod.optional(),
  note: optionalText('the note to the studio', MAX_ORDER_NOTE),
  /**
   * The customer ticked that they have read the safety notes for the garment and size. Needed when any note is more
   * than good practice (a caution or a warning); the server works the notes out itself and refuses (422) without it.
   */
  hasReadSafetyNotes: z.boolean().optional(),
});
export type PlaceOrderRequest = z.infer<typeof placeOrderRequest>;

/** Where the browser goes to pay: the payment provider's hosted page. */
export const checkoutStartedResponse = z.object({ number: z.string(), checkoutUrl: z.string() });
export type CheckoutStartedResponse = z.infer<typeof checkoutStartedResponse>;

export const orderNumberParam = z.object({
  number: z.string().regex(/^[A-Z]{2}-\d{1,10}$/, 'must look like WB-1001'),
});

export const proofParams = orderNumberParam.extend({
  version: z
    .string()
    .regex(/^[1-9]\d{0,3}$/, 'must be a proof version')
    .transform(Number),
});

/** A point on the proof image, as percentages of its width and height from the top left. */
export const proofPin = z.strictObject({
  xPct: z
    .number({ error: 'Place the pin on the picture' })
    .min(0, 'Place the pin on the picture')
    .max(100, 'Place the pin on the picture'),
  yPct: z
    .number({ error: 'Place the pin on the picture' })
    .min(0, 'Place the pin on the picture')
    .max(100, 'Place the pin on the picture'),
  comment: text('what to change here', MAX_PIN_COMMENT),
});
export type ProofPin = z.infer<typeof proofPin>;

/** The customer's answer to a proof: approval may say something; a change request says what to change. */
export const proofAnswerRequest = z.strictObject({
  comment: optionalText('your comment', MAX_PROOF_COMMENT),
  pins: z
    .array(proofPin)
    .max(MAX_PROOF_PINS, `Drop at most ${MAX_PROOF_PINS} pins; put the rest in your comment`)
    .default([]),
});
export type ProofAnswerRequest = z.input<typeof proofAnswerRequest>;

export const customerOrderActions = z.enum(['pay', 'cancel', 'approve_proof', 'request_changes']);
export type CustomerOrderAction = z.infer<typeof customerOrderActions>;

const orderSummary = z.object({
  number: z.string(),
  status: orderStatus,
  paymentStatus,
  /** What the order is, for the list: the design's name, garment and size. */
  description: z.string(),
  designName: z.string(),
  garmentName: z.string(),
  totalCents: z.number().int(),
  currency: z.string(),
  neededBy: z.string().nullable(),
  /** When it is due: the date asked for, else the lead time in the shop's working days after the card was held. */
  dueDate: z.string().nullable(),
  createdAt: z.string(),
  placedAt: z.string().nullable(),
  /** True when the order waits on the customer: a payment to make or a proof to answer. */
  isWaitingOnCustomer: z.boolean(),
});
export type CustomerOrderSummary = z.infer<typeof orderSummary>;

export const customerOrderListResponse = z.object({ orders: z.array(orderSummary) });

/** One step in the order's history, worded for the customer. */
const timelineEntry = z.object({
  id: z.number().int(),
  type: z.string(),
  title: z.string(),
  note: z.string().nullable(),
  at: z.string(),
});

const proofSummary = z.object({
  version: z.number().int(),
  status: z.enum(['sent', 'approved', 'changes_requested', 'superseded']),
  message: z.string().nullable(),
  source: z.enum(['render', 'photo']),
  sentAt: z.string(),
  respondedAt: z.string().nullable(),
  customerComment: z.string().nullable(),
  pins: z.array(z.object({ xPct: z.number(), yPct: z.number(), comment: z.string() })),
  /** Null when the studio sent the proof without a picture. */
  imageUrl: z.string().nullable(),
  /** Only the latest version the studio sent, while unanswered, takes an answer. */
  isAnswerable: z.boolean(),
  /** What the studio changed since the version before, in words. */
  changes: z.array(z.string()),
  /** The price that approving this proof agrees to, against the order's total when it was sent. */
  price: proofPrice,
});
export type CustomerProof = z.infer<typeof proofSummary>;

export const customerOrderResponse = z.object({
  order: orderSummary.extend({
    subtotalCents: z.number().int(),
    taxCents: z.number().int(),
    quantity: z.number().int(),
    isRush: z.boolean(),
    shippingCents: z.number().int(),
    shipTo: shownAddress,
    delivery: orderDelivery,
    customerNote: z.string().nullable(),
  }),
  quote: z.object({
    ruleSetVersion: z.number().int(),
    lines: z.array(quoteLine),
  }),
  design: z.object({
    id: z.number().int(),
    name: z.string(),
    garmentId: z.number().int(),
    garmentSlug: z.string(),
    garmentName: z.string(),
    sizeId: z.number().int(),
    sizeLabel: z.string(),
    colourId: z.number().int(),
    colourName: z.string(),
    colourHex: z.string(),
    document: designDocument,
    /** The customer's uploads its artwork placements show. */
    uploads: z.array(designUploadPicture),
  }),
  /** The safety notes for the garment, size and motifs as ordered, worked out as the catalogue states them now. */
  cautions: z.array(guidanceMessage),
  /** Where two placements of the design would be stitched over each other (the proof's overlap warning). */
  layoutNotes: z.array(guidanceMessage).optional(),
  payment: z.object({
    /** Held on the card, not yet charged. */
    heldCents: z.number().int(),
    chargedCents: z.number().int(),
    refundedCents: z.number().int(),
    /** When the hold lapses unless the studio charges it; ISO 8601. */
    holdExpiresAt: z.string().nullable(),
    /** Set when the latest attempt to pay did not go through, in words for the customer. */
    failureMessage: z.string().nullable(),
    /** The card is kept for the charge at approval and nothing is held (the work is due after a hold would end). */
    isCardSaved: z.boolean(),
    /** The page to pay on when the customer's bank wants them to confirm the charge themselves. */
    confirmPaymentUrl: z.string().nullable(),
  }),
  proofs: z.array(proofSummary),
  timeline: z.array(timelineEntry),
  actions: z.array(customerOrderActions),
});
export type CustomerOrderResponse = z.infer<typeof customerOrderResponse>;
