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
  shipped: 'Sent',
  cancelled: 'Cancelled',
  refunded: 'Refunded',
};
