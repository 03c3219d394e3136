import type { StudioKey } from './accounts.ts';

/** A pointer the customer dropped on the proof image, as percentages of its width and height. */
export interface CommentPin {
  xPct: number;
  yPct: number;
  comment: string;
}

/**
 * One thing that happened to an order. The order's status, its payment, proofs, events and e-mails are all
 * derived from these steps (order-history.ts), so they cannot contradict each other.
 */
export type OrderStep =
  | { type: 'order_created'; at: string }
  | { type: 'payment_authorized'; at: string }
  | { type: 'proof_sent'; at: string; by: StudioKey; message: string; isMailFailing?: boolean }
  | { type: 'changes_requested'; at: string; note: string; pins: CommentPin[] }
  | { type: 'proof_approved'; at: string; note?: string }
  | { type: 'payment_captured'; at: string; by: StudioKey }
  | { type: 'note_added'; at: string; by: StudioKey; note: string }
  | { type: 'stitched'; at: string; by: StudioKey }
  | { type: 'shipped'; at: string; by: StudioKey; trackingNumber: string }
  | { type: 'refunded'; at: string; by: StudioKey; amountCents?: number; note: string }
  | { type: 'cancelled'; at: string; by: StudioKey | 'customer'; note: string };
