import { queryOptions, useQuery } from '@tanstack/react-query';
import { studioGarmentListResponse } from '@server/contracts/admin-catalogue-garments.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getStudioGarments = () => apiRequest('/admin/catalogue/garments', studioGarmentListResponse);

export const studioGarmentsQuery = () =>
  queryOptions({ queryKey: ['admin', 'catalogue', 'garments'], queryFn: getStudioGarments, staleTime: 60_000 });

export const useStudioGarments = () => useQuery(studioGarmentsQuery());
