import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ruleSetDetailResponse } from '@server/contracts/admin-pricing.ts';
import { apiRequest } from '@ui/api-client.ts';
import { ruleSetsQuery } from './get-rule-sets.ts';

export const startDraft = () =>
  apiRequest('/admin/pricing/drafts', ruleSetDetailResponse, { method: 'POST', body: {} });

export function useStartDraft() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: startDraft,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ruleSetsQuery().queryKey }),
  });
}
