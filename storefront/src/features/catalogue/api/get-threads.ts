import { queryOptions, useQuery } from '@tanstack/react-query';
import { threadListResponse } from '@server/contracts/catalogue.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getThreads = () => apiRequest('/catalogue/threads', threadListResponse).then((body) => body.threads);

export const threadsQuery = () =>
  queryOptions({ queryKey: ['catalogue', 'threads'], queryFn: getThreads, staleTime: 5 * 60_000 });

export const useThreads = () => useQuery(threadsQuery());
