import { queryOptions, useQuery } from '@tanstack/react-query';
import { threadListResponse } from '@server/contracts/catalog.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getThreads = () => apiRequest('/catalog/threads', threadListResponse).then((body) => body.threads);

export const threadsQuery = () => queryOptions({ queryKey: ['catalog', 'threads'], queryFn: getThreads, staleTime: 5 * 60_000 });

export const useThreads = () => useQuery(threadsQuery());
