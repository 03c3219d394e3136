import { queryOptions, useQuery } from '@tanstack/react-query';
import { dueOrdersResponse } from '@server/contracts/studio-orders.ts';
import { apiRequest } from '@ui/api-client.ts';
import { orderBoardKey } from './get-order-board.ts';

export const getDueOrders = (from: string, to: string) =>
  apiRequest(`/admin/orders/due?from=${from}&to=${to}`, dueOrdersResponse);

export const dueOrdersQuery = (from: string, to: string) =>
  queryOptions({ queryKey: [...orderBoardKey, 'due', from, to], queryFn: () => getDueOrders(from, to) });

export const useDueOrders = (from: string, to: string) => useQuery(dueOrdersQuery(from, to));
