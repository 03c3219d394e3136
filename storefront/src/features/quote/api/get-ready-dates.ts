import { queryOptions, useQuery } from '@tanstack/react-query';
import { readyDates } from '@server/contracts/stored-quotes.ts';
import { apiRequest } from '@ui/api-client.ts';

/** When an order placed today could be ready, from the studio's lead time; the server works it out. */
export const readyDatesQuery = () =>
  queryOptions({
    queryKey: ['quotes', 'ready-dates'],
    queryFn: () => apiRequest('/quotes/ready-dates', readyDates),
    staleTime: 10 * 60_000,
  });

export const useReadyDates = () => useQuery(readyDatesQuery());
