import { queryOptions, useQuery } from '@tanstack/react-query';
import { garmentListResponse } from '@server/contracts/catalogue.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getGarments = () => apiRequest('/catalogue/garments', garmentListResponse).then((body) => body.garments);

export const garmentsQuery = () =>
  queryOptions({ queryKey: ['catalogue', 'garments'], queryFn: getGarments, staleTime: 5 * 60_000 });

export const useGarments = () => useQuery(garmentsQuery());
