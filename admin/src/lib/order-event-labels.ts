import { shippedWords } from '@server/contracts/order-status.ts';

/** Plain words for what happened to an order; unknown kinds of event fall back to their own name. */
const eventLabels: Record<string, string> = {
  order_created: 'Order placed',
  safety_notes_read: 'Customer ticked they read the safety notes',
  payment_authorized: 'Card held (not charged yet)',
  proof_sent: 'Proof sent',
  changes_requested: 'Customer asked for changes',
  proof_approved: 'Customer approved the proof',
  payment_captured: 'Card charged',
  note_added: 'Note',
  stitched: 'Stitched',
  shipped: shippedWords.either,
  refunded: 'Refunded',
  cancelled: 'Cancelled',
  authorization_lapsed: 'Card hold ran out (customer asked to pay again)',
  payment_voided: 'Card hold released',
};

export const eventLabel = (type: string): string => eventLabels[type] ?? type.replaceAll('_', ' ');
