import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ruleSetDetailResponse, type UpdateDraftRequest } from '@server/contracts/admin-pricing.ts';
import { apiRequest } from '@ui/api-client.ts';
import { ruleSetQuery } from './get-rule-set.ts';
import { ruleSetsQuery } from './get-rule-sets.ts';

export const saveDraft = (id: number, body: UpdateDraftRequest) =>
  apiRequest(`/admin/pricing/${id}`, ruleSetDetailResponse, { method: 'PUT', body });

export function useSaveDraft(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateDraftRequest) => saveDraft(id, body),
    onSuccess: (saved) => {
      queryClient.setQueryData(ruleSetQuery(id).queryKey, saved);
      void queryClient.invalidateQueries({ queryKey: ruleSetsQuery().queryKey });
    },
  });
}
