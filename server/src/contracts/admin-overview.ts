import { z } from 'zod';

export const orderStatuses = [
  'awaiting_payment',
  'needs_proof',
  'proof_sent',
  'changes_requested',
  'proof_approved',
  'in_production',
  'stitched',
  'shipped',
  'cancelled',
] as const;
export const orderStatus = z.enum(orderStatuses);
export type OrderStatus = z.infer<typeof orderStatus>;

export const recentOrder = z.object({
  id: z.number().int(),
  number: z.string(),
  customerName: z.string(),
  status: orderStatus,
  totalCents: z.number().int(),
  currency: z.string(),
  neededBy: z.string().nullable(),
  placedAt: z.string().nullable(),
});

export const adminOverviewResponse = z.object({
  shopName: z.string(),
  countsByStatus: z.record(z.string(), z.number().int()),
  recentOrders: z.array(recentOrder),
});
export type AdminOverviewResponse = z.infer<typeof adminOverviewResponse>;
