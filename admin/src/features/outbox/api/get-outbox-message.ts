import { queryOptions, useQuery } from '@tanstack/react-query';
import { outboxMessageResponse } from '@server/contracts/admin-outbox.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getOutboxMessage = (id: number) => apiRequest(`/admin/outbox/${id}`, outboxMessageResponse);

export const outboxMessageQuery = (id: number) =>
  queryOptions({ queryKey: ['admin', 'outbox', 'message', id], queryFn: () => getOutboxMessage(id) });

export const useOutboxMessage = (id: number | undefined) =>
  useQuery({ ...outboxMessageQuery(id ?? 0), enabled: id !== undefined });
