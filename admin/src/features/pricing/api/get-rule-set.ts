import { queryOptions, useQuery } from '@tanstack/react-query';
import { ruleSetDetailResponse } from '@server/contracts/admin-pricing.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getRuleSet = (id: number) => apiRequest(`/admin/pricing/${id}`, ruleSetDetailResponse);

export const ruleSetQuery = (id: number) =>
  queryOptions({ queryKey: ['admin', 'pricing', 'rule-set', id], queryFn: () => getRuleSet(id) });

export const useRuleSet = (id: number | undefined) => useQuery({ ...ruleSetQuery(id ?? 0), enabled: id !== undefined });
