import { z } from 'zod';
import { quotePreviewRequest, quotePreviewResponse } from './quotes.ts';

const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/);

/** A quote to keep: the same design to price as a preview, plus the customer's saved design it prices, if any. */
export const createQuoteRequest = quotePreviewRequest.extend({
  designId: z
    .number({ error: 'Choose one of your saved designs' })
    .int('Choose one of your saved designs')
    .positive('Choose one of your saved designs')
    .optional(),
});
export type CreateQuoteRequest = z.infer<typeof createQuoteRequest>;

export const quoteIdParams = z.object({
  id: z
    .string()
    .regex(/^[1-9]\d{0,9}$/, 'must be a quote number')
    .transform(Number),
});

/** When an order could be ready, from the shop's lead time in working days (Monday to Friday). */
export const readyDates = z.object({
  leadTimeDays: z.number().int(),
  /** The first day an order priced without rush can be ready, YYYY-MM-DD in the shop's time zone. */
  earliestReadyDate: isoDate,
  /** The first day a rush order can be ready: half the lead time. */
  earliestRushDate: isoDate,
});
export type ReadyDates = z.infer<typeof readyDates>;

/** A stored quote: the preview's figures with its id, the price it holds until it expires, and the ready dates. */
export const storedQuoteResponse = quotePreviewResponse.extend({
  quoteId: z.number().int(),
  designId: z.number().int().nullable(),
  quantity: z.number().int(),
  isRush: z.boolean(),
  /** ISO 8601; after this the price is worked out again from the current price list. */
  expiresAt: z.string(),
  readyDates,
});
export type StoredQuoteResponse = z.infer<typeof storedQuoteResponse>;
