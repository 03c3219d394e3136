import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { peopleResponse } from '@server/contracts/admin-users.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getPeople = (search: string) =>
  apiRequest(`/admin/users${search ? `?search=${encodeURIComponent(search)}` : ''}`, peopleResponse);

export const peopleQuery = (search = '') =>
  queryOptions({
    queryKey: ['admin', 'people', { search }],
    queryFn: () => getPeople(search),
    placeholderData: keepPreviousData,
  });

export const usePeople = (search: string, isAllowed: boolean) =>
  useQuery({ ...peopleQuery(search), enabled: isAllowed });
