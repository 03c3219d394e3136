import { queryOptions, useQuery } from '@tanstack/react-query';
import { studioCatalogueResponse } from '@server/contracts/admin-catalogue.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getStudioCatalogue = () => apiRequest('/admin/catalogue', studioCatalogueResponse);

export const studioCatalogueQuery = () =>
  queryOptions({ queryKey: ['admin', 'catalogue'], queryFn: getStudioCatalogue, staleTime: 60_000 });

export const useStudioCatalogue = () => useQuery(studioCatalogueQuery());
