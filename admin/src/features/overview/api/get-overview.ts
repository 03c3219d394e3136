import { queryOptions, useQuery } from '@tanstack/react-query';
import { adminOverviewResponse } from '@server/contracts/admin-overview.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getOverview = () => apiRequest('/admin/overview', adminOverviewResponse);

export const overviewQuery = () =>
  queryOptions({ queryKey: ['admin', 'overview'], queryFn: getOverview, staleTime: 30_000 });

export const useOverview = () => useQuery(overviewQuery());
