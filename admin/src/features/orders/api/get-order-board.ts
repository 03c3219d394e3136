import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { orderBoardResponse, type OrderBoardQuery } from '@server/contracts/studio-orders.ts';
import { apiRequest } from '@ui/api-client.ts';

/** The query string of a board request; defaults are left out so the cache key and the URL stay short. */
export function boardSearch(query: OrderBoardQuery): string {
  const params = new URLSearchParams();
  if (query.status?.length) params.set('status', query.status.join(','));
  if (query.dueFrom) params.set('dueFrom', query.dueFrom);
  if (query.dueTo) params.set('dueTo', query.dueTo);
  if (query.customer) params.set('customer', String(query.customer));
  if (query.q) params.set('q', query.q);
  if (query.sort !== 'placed') params.set('sort', query.sort);
  if (query.dir !== 'desc') params.set('dir', query.dir);
  if (query.page !== 1) params.set('page', String(query.page));
  if (query.pageSize !== 25) params.set('pageSize', String(query.pageSize));
  return params.toString();
}

export const getOrderBoard = (query: OrderBoardQuery) => {
  const search = boardSearch(query);
  return apiRequest(`/admin/orders${search ? `?${search}` : ''}`, orderBoardResponse);
};

/** Every board page lives under this key, so an action on one order refreshes whichever pages are cached. */
export const orderBoardKey = ['admin', 'orders', 'board'] as const;

export const orderBoardQueryOptions = (query: OrderBoardQuery) =>
  queryOptions({
    queryKey: [...orderBoardKey, boardSearch(query)],
    queryFn: () => getOrderBoard(query),
    placeholderData: keepPreviousData,
  });

export const useOrderBoard = (query: OrderBoardQuery) => useQuery(orderBoardQueryOptions(query));
