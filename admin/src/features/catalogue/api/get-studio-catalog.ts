import { queryOptions, useQuery } from '@tanstack/react-query';
import { studioCatalogResponse } from '@server/contracts/admin-catalog.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getStudioCatalog = () => apiRequest('/admin/catalog', studioCatalogResponse);

export const studioCatalogQuery = () => queryOptions({ queryKey: ['admin', 'catalog'], queryFn: getStudioCatalog, staleTime: 60_000 });

export const useStudioCatalog = () => useQuery(studioCatalogQuery());
