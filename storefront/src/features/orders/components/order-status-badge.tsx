import { shippedWords, type OrderStatus } from '@server/contracts/order-status.ts';

/** Each status as the customer reads it, with the badge colours. */
export const orderStatusWords: Record<OrderStatus, { label: string; tone: string }> = {
  awaiting_payment: { label: 'Waiting for payment', tone: 'bg-saffron-100 text-walnut-900' },
  authorized: { label: 'Proof on its way', tone: 'bg-sage-50 text-sage-700' },
  proof_sent: { label: 'Proof ready for you', tone: 'bg-saffron-100 text-walnut-900' },
  changes_requested: { label: 'Changes on their way', tone: 'bg-sage-50 text-sage-700' },
  proof_approved: { label: 'Approved, about to start', tone: 'bg-sage-50 text-sage-700' },
  in_production: { label: 'Being stitched', tone: 'bg-sage-50 text-sage-700' },
  stitched: { label: 'Stitched, packing', tone: 'bg-sage-50 text-sage-700' },
  shipped: { label: shippedWords.either, tone: 'bg-linen-200 text-walnut-900' },
  cancelled: { label: 'Cancelled', tone: 'bg-linen-200 text-walnut-700' },
  refunded: { label: 'Refunded', tone: 'bg-linen-200 text-walnut-700' },
};

export function OrderStatusBadge({ status }: { status: OrderStatus }) {
  const words = orderStatusWords[status];
  return (
    <span className={`inline-block rounded-full px-3 py-1 text-xs font-semibold ${words.tone}`}>{words.label}</span>
  );
}
