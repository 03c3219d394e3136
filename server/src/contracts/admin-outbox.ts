import { z } from 'zod';

/** queued: not tried yet; retrying: an attempt failed and another is due; failed: no more attempts. */
export const mailStatus = z.enum(['queued', 'retrying', 'sent', 'failed']);
export type MailStatus = z.infer<typeof mailStatus>;

export const outboxPageSize = 20;

export const outboxQuery = z.object({
  page: z.coerce
    .number({ error: 'Use a whole page number' })
    .int('Use a whole page number')
    .min(1, 'Pages start at 1')
    .max(10_000, 'That page is too far')
    .default(1),
  order: z
    .string()
    .trim()
    .toUpperCase()
    .regex(/^WB-\d{1,8}$/, 'Use an order number such as WB-1003')
    .optional(),
  status: mailStatus.optional(),
});
export type OutboxQuery = z.infer<typeof outboxQuery>;

export const outboxEntry = z.object({
  id: z.number().int(),
  toEmail: z.string(),
  subject: z.string(),
  template: z.string(),
  status: mailStatus,
  error: z.string().nullable(),
  /** Attempts made so far, and when the next is due while it is retrying. */
  attempts: z.number().int(),
  nextAttemptAt: z.string().nullable(),
  orderNumber: z.string().nullable(),
  createdAt: z.string(),
});
export type OutboxEntry = z.infer<typeof outboxEntry>;

export const outboxListResponse = z.object({
  messages: z.array(outboxEntry),
  page: z.number().int(),
  pageSize: z.number().int(),
  total: z.number().int(),
});
export type OutboxListResponse = z.infer<typeof outboxListResponse>;

export const outboxIdParams = z.object({
  id: z.coerce
    .number({ error: 'Use a message id such as 4' })
    .int('Use a message id such as 4')
    .min(1, 'Use a message id such as 4'),
});

export const outboxMessageResponse = z.object({
  message: outboxEntry.extend({
    textBody: z.string().nullable(),
    htmlBody: z.string().nullable(),
    providerMessageId: z.string().nullable(),
    updatedAt: z.string(),
  }),
});
export type OutboxMessageResponse = z.infer<typeof outboxMessageResponse>;
