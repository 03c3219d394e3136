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

/** An order that needs the studio today, with the date it is due (the customer's, else placed + lead time). */
export const actionOrder = recentOrder.extend({ dueDate: z.string().nullable(), isOverdue: z.boolean() });
export type ActionOrder = z.infer<typeof actionOrder>;

export const actionGroupKinds = [
  /** Paid orders with a customer's picture whose stitch file is not entered yet: its price is still to confirm. */
  'pictures_to_digitize',
  'proofs_to_send',
  'changes_asked',
  'awaiting_charge',
  'due_soon',
  'ready_to_ship',
] as const;
export type ActionGroupKind = (typeof actionGroupKinds)[number];

export const actionGroup = z.object({ kind: z.enum(actionGroupKinds), orders: z.array(actionOrder) });

export const machineWeek = z.object({ weekStart: z.string(), bookedHours: z.number(), orderCount: z.number().int() });
export const revenueWeek = z.object({
  weekStart: z.string(),
  capturedCents: z.number().int(),
  refundedCents: z.number().int(),
  netCents: z.number().int(),
});

export const adminOverviewResponse = z.object({
  shopName: z.string(),
  countsByStatus: z.record(z.string(), z.number().int()),
  recentOrders: z.array(recentOrder),
  today: z.string(),
  actions: z.array(actionGroup),
  /** Orders not yet stitched, by the week they are due; capacity is the shop's machine hours per week. */
  machineHours: z.object({ capacityHours: z.number(), leadTimeDays: z.number().int(), weeks: z.array(machineWeek) }),
  /** Captured payments minus refunds, by the week the money moved. */
  revenue: z.object({ currency: z.string(), weeks: z.array(revenueWeek) }),
});
export type AdminOverviewResponse = z.infer<typeof adminOverviewResponse>;
