import { queryOptions, useQuery } from '@tanstack/react-query';
import { customerOrderListResponse } from '@server/contracts/orders.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getOrders = () => apiRequest('/orders', customerOrderListResponse).then((body) => body.orders);

export const ordersQuery = () => queryOptions({ queryKey: ['orders'], queryFn: getOrders });

export const useOrders = (options: { enabled?: boolean } = {}) => useQuery({ ...ordersQuery(), ...options });
