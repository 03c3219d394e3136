import { z } from 'zod';

/** Every status an order can be in, in the order work flows; the transitions are in services/order-flow.ts. */
export const orderStatuses = [
  'awaiting_payment',
  'authorized',
  'proof_sent',
  'changes_requested',
  'proof_approved',
  'in_production',
  'stitched',
  'shipped',
  'cancelled',
  'refunded',
] as const;
export const orderStatus = z.enum(orderStatuses);
export type OrderStatus = z.infer<typeof orderStatus>;

export const paymentStatuses = ['none', 'authorized', 'captured', 'partially_refunded', 'refunded', 'voided'] as const;
export const paymentStatus = z.enum(paymentStatuses);
export type PaymentStatus = z.infer<typeof paymentStatus>;
