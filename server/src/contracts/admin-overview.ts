import { z } from 'zod';

import { orderStatus } from './order-status.ts';

export { orderStatus, orderStatuses, type OrderStatus } from './order-status.ts';

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
