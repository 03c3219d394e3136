import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ruleSetDetailResponse } from '@server/contracts/admin-pricing.ts';
import { apiRequest } from '@ui/api-client.ts';
import { ruleSetsQuery } from './get-rule-sets.ts';

export const publishRuleSet = (id: number) =>
  apiRequest(`/admin/pricing/${id}/publish`, ruleSetDetailResponse, { method: 'POST', body: {} });

export function usePublishRuleSet() {
  const queryClient = useQueryClient();
  // Every price list's status moves, so everything under the pricing key is stale.
  return useMutation({
    mutationFn: publishRuleSet,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ruleSetsQuery().queryKey.slice(0, 2) }),
  });
}
