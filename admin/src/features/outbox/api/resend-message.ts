import { useMutation, useQueryClient } from '@tanstack/react-query';
import { outboxMessageResponse } from '@server/contracts/admin-outbox.ts';
import { apiRequest } from '@ui/api-client.ts';

export const resendMessage = (id: number) =>
  apiRequest(`/admin/outbox/${id}/resend`, outboxMessageResponse, { method: 'POST', body: {} });

/** Sends a failed message again; the list and the message show how it went. */
export function useResendMessage() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resendMessage,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['admin', 'outbox'] }),
  });
}
