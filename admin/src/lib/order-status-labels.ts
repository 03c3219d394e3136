import { shippedWords } from '@server/contracts/order-status.ts';
import type { OrderStatus } from '@server/contracts/admin-overview.ts';

/** Plain names for the order statuses, in the order work flows through the studio. */
export const statusLabels: Record<OrderStatus, string> = {
  awaiting_payment: 'Card not yet held',
  authorized: 'Proof to send',
  proof_sent: 'Waiting on customer',
  changes_requested: 'Changes asked',
  proof_approved: 'Ready to charge',
  in_production: 'On the machine',
  stitched: 'Ready to ship',
  shipped: shippedWords.either,
  cancelled: 'Cancelled',
  refunded: 'Refunded',
};

const byWord = new Map<string, OrderStatus>();
/**
 * Each status as the board's page address spells it: its plain name in lower case with hyphens
 * (`?status=proof-to-send`), so nobody reads a stored code in a link they share.
 */
export const statusWords = Object.fromEntries(
  Object.entries(statusLabels).map(([status, label]) => {
    const word = label.toLowerCase().replace(/[^a-z0-9]+/g, '-');
    byWord.set(word, status as OrderStatus);
    return [status, word];
  }),
) as Record<OrderStatus, string>;

/** The status a word from the address names; a stored code (an older bookmark) is read as itself. */
export const statusOfWord = (word: string): string => byWord.get(word) ?? word;
