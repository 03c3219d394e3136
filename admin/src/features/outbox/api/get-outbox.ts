import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { outboxListResponse, type MailStatus } from '@server/contracts/admin-outbox.ts';
import { apiRequest } from '@ui/api-client.ts';

export interface OutboxFilter {
  page: number;
  order?: string;
  status?: MailStatus;
}

export function getOutbox(filter: OutboxFilter) {
  const params = new URLSearchParams({ page: String(filter.page) });
  if (filter.order) params.set('order', filter.order);
  if (filter.status) params.set('status', filter.status);
  return apiRequest(`/admin/outbox?${params}`, outboxListResponse);
}

export const outboxQuery = (filter: OutboxFilter) =>
  queryOptions({
    queryKey: ['admin', 'outbox', 'list', filter],
    queryFn: () => getOutbox(filter),
    placeholderData: keepPreviousData,
  });

export const useOutbox = (filter: OutboxFilter) => useQuery(outboxQuery(filter));
