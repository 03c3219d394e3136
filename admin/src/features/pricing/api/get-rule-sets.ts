import { queryOptions, useQuery } from '@tanstack/react-query';
import { ruleSetListResponse } from '@server/contracts/admin-pricing.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getRuleSets = () => apiRequest('/admin/pricing', ruleSetListResponse);

export const ruleSetsQuery = () => queryOptions({ queryKey: ['admin', 'pricing', 'list'], queryFn: getRuleSets });

export const useRuleSets = () => useQuery(ruleSetsQuery());
