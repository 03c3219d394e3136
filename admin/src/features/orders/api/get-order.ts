import { queryOptions, useQuery } from '@tanstack/react-query';
import { orderDetailResponse } from '@server/contracts/admin-orders.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getOrder = (number: string) =>
  apiRequest(`/admin/orders/${encodeURIComponent(number)}`, orderDetailResponse);

export const orderQuery = (number: string) =>
  queryOptions({ queryKey: ['admin', 'orders', number], queryFn: () => getOrder(number) });

export const useOrder = (number: string) => useQuery(orderQuery(number));
