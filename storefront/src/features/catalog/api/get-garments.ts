import { queryOptions, useQuery } from '@tanstack/react-query';
import { garmentListResponse } from '@server/contracts/catalog.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getGarments = () => apiRequest('/catalog/garments', garmentListResponse).then((body) => body.garments);

export const garmentsQuery = () => queryOptions({ queryKey: ['catalog', 'garments'], queryFn: getGarments, staleTime: 5 * 60_000 });

export const useGarments = () => useQuery(garmentsQuery());
