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

export const paymentStatuses = [
  'none',
  'authorized',
  'saved',
  'captured',
  'partially_refunded',
  'refunded',
  'voided',
] as const;
export const paymentStatus = z.enum(paymentStatuses);
export type PaymentStatus = z.infer<typeof paymentStatus>;

/** Finished with: nothing more for the studio to do. */
export const closedOrderStatuses = ['shipped', 'cancelled', 'refunded'] as const satisfies readonly OrderStatus[];
/** The studio's work in hand: from a held card to stitched and waiting to ship. */
export const openOrderStatuses = [
  'authorized',
  'proof_sent',
  'changes_requested',
  'proof_approved',
  'in_production',
  'stitched',
] as const satisfies readonly OrderStatus[];
/** The customer's card is held and not yet charged. */
export const cardHeldOrderStatuses = [
  'authorized',
  'proof_sent',
  'changes_requested',
  'proof_approved',
] as const satisfies readonly OrderStatus[];
/** The customer approved a proof: the design is settled and may be made (the production sheet exists). */
export const approvedOrderStatuses = [
  'proof_approved',
  'in_production',
  'stitched',
  'shipped',
] as const satisfies readonly OrderStatus[];

/**
 * The one word for a shipped order on both sides and in the e-mails: a delivery order is posted, a pick-up order
 * collected; where the method does not matter (the status on the board, its filter, a badge) both are named.
 */
export const shippedWords = { delivery: 'Posted', pickup: 'Collected', either: 'Posted or collected' } as const;

/** Whether a status is in one of the groups above. */
export const isIn = (group: readonly OrderStatus[], status: OrderStatus): boolean => group.includes(status);
