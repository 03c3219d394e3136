import { z } from 'zod';
import { orderStatus, orderStatuses, paymentStatus } from './order-status.ts';
import { designDocument } from './designs.ts';

/**
 * The studio's order board and the actions on one order: the list with its filters, the due-date calendar, and the
 * requests and answers of sending a proof, charging, cancelling, refunding, marking stitched and shipping.
 */

const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'use a date like 2026-12-24')
  .refine((value) => !Number.isNaN(Date.parse(value)), 'is not a real date');

export const boardSortKeys = ['placed', 'due', 'total', 'status', 'number'] as const;
export type BoardSortKey = (typeof boardSortKeys)[number];

/** `status=a,b` or `status=a&status=b`: several statuses at once. */
const statusList = z
  .union([z.string(), z.array(z.string())])
  .transform((value) =>
    (Array.isArray(value) ? value : [value])
      .flatMap((part) => part.split(','))
      .map((part) => part.trim())
      .filter(Boolean),
  )
  .pipe(z.array(z.enum(orderStatuses, { error: `choose from ${orderStatuses.join(', ')}` })).max(orderStatuses.length));

export const orderBoardQuery = z
  .object({
    status: statusList.optional(),
    dueFrom: isoDate.optional(),
    dueTo: isoDate.optional(),
    customer: z.coerce
      .number({ error: 'must be a customer id' })
      .int('must be a customer id')
      .positive('must be a customer id')
      .optional(),
    q: z.string().trim().max(100, 'keep the search under 100 characters').optional(),
    sort: z.enum(boardSortKeys, { error: `sort by ${boardSortKeys.join(', ')}` }).default('placed'),
    dir: z.enum(['asc', 'desc'], { error: 'use asc or desc' }).default('desc'),
    page: z.coerce
      .number({ error: 'must be a page number' })
      .int('must be a whole number')
      .min(1, 'pages start at 1')
      .max(10_000, 'is past the last page')
      .default(1),
    pageSize: z.coerce
      .number({ error: 'must be a number' })
      .int('must be a whole number')
      .min(1, 'show at least 1')
      .max(100, 'show at most 100')
      .default(25),
  })
  .refine((query) => !query.dueFrom || !query.dueTo || query.dueFrom <= query.dueTo, {
    path: ['dueTo'],
    message: 'must be on or after the first due date',
  });
export type OrderBoardQuery = z.infer<typeof orderBoardQuery>;

export const boardOrder = z.object({
  number: z.string(),
  status: orderStatus,
  paymentStatus,
  customer: z.object({ id: z.number().int(), name: z.string(), email: z.string() }),
  placedAt: z.string().nullable(),
  neededBy: z.string().nullable(),
  /** When it is due (`dueDateOf`): the customer's date, else the lead time after the card was held; null before. */
  dueDate: z.string().nullable(),
  isRush: z.boolean(),
  /** Due before the shop's today and not yet shipped, cancelled or refunded. */
  isOverdue: z.boolean(),
  totalCents: z.number().int(),
  currency: z.string(),
  itemSummary: z.string(),
});
export type BoardOrder = z.infer<typeof boardOrder>;

export const orderBoardResponse = z.object({
  rows: z.array(boardOrder),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});
export type OrderBoardResponse = z.infer<typeof orderBoardResponse>;

/** The calendar asks for at most this many days at once. */
export const MAX_DUE_RANGE_DAYS = 92;

export const dueOrdersQuery = z
  .object({ from: isoDate, to: isoDate })
  .refine((range) => range.from <= range.to, { path: ['to'], message: 'must be on or after “from”' })
  .refine((range) => (Date.parse(range.to) - Date.parse(range.from)) / 86_400_000 < MAX_DUE_RANGE_DAYS, {
    path: ['to'],
    message: `show at most ${MAX_DUE_RANGE_DAYS} days at once`,
  });
export type DueOrdersQuery = z.infer<typeof dueOrdersQuery>;

export const dueOrdersResponse = z.object({
  from: z.string(),
  to: z.string(),
  /** The shop's today (its time zone), from the server's clock, so "overdue" means the same on every screen. */
  today: z.string(),
  /**
   * Open orders due in the range, plus open orders already overdue (due before today), soonest first; an order
   * without a date asked for is due by the lead time.
   */
  orders: z.array(boardOrder),
});
export type DueOrdersResponse = z.infer<typeof dueOrdersResponse>;

const message = z
  .string()
  .trim()
  .min(1, 'write a short note for the customer')
  .max(2000, 'keep the note under 2,000 characters');

/** JSON for a render; multipart (`file` + these fields) for a photo of a test stitch-out. */
export const sendProofRequest = z.discriminatedUnion(
  'source',
  [
    // A render may carry the studio's changed version of the design, which the proof then shows and prices.
    z.object({ source: z.literal('render'), message, document: designDocument.optional() }),
    z.object({ source: z.literal('photo'), message }),
  ],
  { error: 'choose render or photo' },
);
export type SendProofRequest = z.infer<typeof sendProofRequest>;

export const sentProofResponse = z.object({
  version: z.number().int(),
  source: z.enum(['render', 'photo']),
  status: orderStatus,
  imageUrl: z.string(),
});
export type SentProofResponse = z.infer<typeof sentProofResponse>;

/** Where the studio app loads a proof's picture. */
export const proofImagePath = (number: string, version: number) =>
  `/api/admin/orders/${encodeURIComponent(number)}/proofs/${version}/image`;

/** The drawing a render proof would send, made afresh and not kept. */
export const proofPreviewPath = (number: string) => `/api/admin/orders/${encodeURIComponent(number)}/proofs/preview`;

export const proofImageParams = z.object({
  number: z.string().regex(/^[A-Z]{2}-\d{1,10}$/, 'must look like WB-1001'),
  version: z.coerce
    .number({ error: 'must be a version number' })
    .int('must be a version number')
    .min(1, 'versions start at 1')
    .max(1000, 'is not a version of this proof'),
});

export const cancelOrderRequest = z.object({
  reason: z
    .string()
    .trim()
    .min(1, 'say why the order is cancelled')
    .max(1000, 'keep the reason under 1,000 characters'),
});
export type CancelOrderRequest = z.infer<typeof cancelOrderRequest>;

export const refundOrderRequest = z.object({
  /** Leave out for a full refund of what is left. */
  amountCents: z
    .number({ error: 'must be an amount in cents' })
    .int('must be whole cents')
    .positive('must be more than 0')
    .optional(),
  reason: z.string().trim().min(1, 'say why the money goes back').max(1000, 'keep the reason under 1,000 characters'),
});
export type RefundOrderRequest = z.infer<typeof refundOrderRequest>;

/** Marking the parcel posted (or, for a pick-up order, handed over): the carrier and its tracking number, if any. */
export const shipOrderRequest = z.object({
  carrier: z
    .string()
    .trim()
    .max(60, 'keep the carrier’s name under 60 characters')
    .optional()
    .transform((value) => value || undefined),
  trackingNumber: z
    .string()
    .trim()
    .max(60, 'keep the tracking number under 60 characters')
    .regex(/^[A-Za-z0-9 -]*$/, 'use letters, digits, spaces and dashes')
    .optional()
    .transform((value) => value || undefined),
});
export type ShipOrderRequest = z.input<typeof shipOrderRequest>;

/** What every action answers: where the order stands now, and the money on its card. */
export const orderActionResponse = z.object({
  number: z.string(),
  status: orderStatus,
  paymentStatus,
  capturedCents: z.number().int(),
  refundedCents: z.number().int(),
});
export type OrderActionResponse = z.infer<typeof orderActionResponse>;
