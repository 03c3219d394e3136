import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  orderActionResponse,
  type CancelOrderRequest,
  type RefundOrderRequest,
  type ShipOrderRequest,
} from '@server/contracts/studio-orders.ts';
import { apiRequest } from '@ui/api-client.ts';
import { orderQuery } from './get-order.ts';
import { orderBoardKey } from './get-order-board.ts';

/**
 * The studio's moves on one order, each a POST under /api/admin/orders/:number answering where the order stands.
 * They share one mutation hook because they differ only in path and body; every one refreshes the order page and
 * the board.
 */
export type OrderActionRequest =
  | { action: 'capture' }
  | { action: 'cancel'; body: CancelOrderRequest }
  | { action: 'refunds'; body: RefundOrderRequest }
  | { action: 'stitched' }
  | { action: 'shipped'; body: ShipOrderRequest };

export const postOrderAction = (number: string, request: OrderActionRequest) =>
  apiRequest(`/admin/orders/${encodeURIComponent(number)}/${request.action}`, orderActionResponse, {
    method: 'POST',
    body: 'body' in request ? request.body : {},
  });

export function useOrderAction(number: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: OrderActionRequest) => postOrderAction(number, request),
    // Refreshed after a refusal too: a 409 usually means the order moved meanwhile (another tab, the customer).
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: orderQuery(number).queryKey }),
        queryClient.invalidateQueries({ queryKey: orderBoardKey }),
      ]),
  });
}
