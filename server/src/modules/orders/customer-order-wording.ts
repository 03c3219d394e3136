/**
 * The order's history as the customer reads it: plain words for each event, the studio's internal notes left
 * out. Amounts come from the event's payload.
 */
import { shippedWords } from '../../contracts/order-status.ts';
import { formatMoneyText } from '../mail/money-text.ts';
import type { StoredOrderEvent } from './customer-order-repo.ts';

export type { StoredOrderEvent };

/** Events whose note is meant for the customer (their own words, or the reason for a cancel or refund). */
const notesShown = new Set(['payment_failed', 'changes_requested', 'proof_approved', 'cancelled', 'refunded']);

function titleOf(event: StoredOrderEvent, currency: string): string | undefined {
  const p = event.payload ?? {};
  const version = typeof p.proofVersion === 'number' ? ` ${p.proofVersion}` : '';
  const amount = typeof p.amountCents === 'number' ? formatMoneyText(p.amountCents, currency) : undefined;
  switch (event.type) {
    case 'order_created':
      return 'You placed the order';
    case 'safety_notes_read':
      return 'You read the safety notes for this garment';
    case 'payment_authorized':
      // Orders due after a hold would lapse keep the card instead of holding an amount on it.
      if (typeof p.setupIntentId === 'string') return 'Your card was saved for this order (nothing charged yet)';
      return amount ? `${amount} held on your card (not charged yet)` : 'Payment held on your card (not charged yet)';
    case 'card_saved':
      return 'Your new card was saved for this order (nothing charged yet)';
    case 'payment_failed':
      return 'The payment did not go through';
    case 'payment_voided':
      return 'The hold on your card was released';
    case 'proof_sent':
      return `Proof${version} is ready for you to look at`;
    case 'changes_requested':
      return `You asked for changes to proof${version}`;
    case 'proof_approved':
      return `You approved proof${version}`;
    case 'price_changed':
      return amount ? `The order now comes to ${amount}, as proof${version} showed` : undefined;
    case 'payment_captured':
      return amount ? `${amount} charged; stitching has started` : 'Card charged; stitching has started';
    case 'stitched':
      return 'Stitched and checked';
    case 'shipped':
      return typeof p.trackingNumber === 'string'
        ? `${shippedWords.delivery} (${p.carrier ?? 'tracking'} ${p.trackingNumber})`
        : shippedWords.either;
    case 'cancelled':
      return 'Order cancelled';
    case 'refunded':
      return amount ? `${amount} refunded` : 'Refunded';
    default:
      // Studio notes and anything internal stay in the studio.
      return undefined;
  }
}

/** The customer's timeline, oldest first. */
export function customerTimeline(events: StoredOrderEvent[], currency: string) {
  return events.flatMap((event) => {
    const title = titleOf(event, currency);
    return title
      ? [
          {
            id: event.id,
            type: event.type,
            title,
            note: notesShown.has(event.type) ? event.note : null,
            at: event.createdAt,
          },
        ]
      : [];
  });
}
