import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../api-client.ts';
import { currentUserQuery } from './get-current-user.ts';

export const signOut = () => apiRequest('/auth/sign-out', null, { method: 'POST', body: {} });

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      queryClient.setQueryData(currentUserQuery().queryKey, null);
      void queryClient.invalidateQueries();
    },
  });
}
