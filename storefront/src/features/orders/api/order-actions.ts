import { useMutation, useQueryClient } from '@tanstack/react-query';
import { checkoutStartedResponse, type ProofAnswerRequest } from '@server/contracts/orders.ts';
import { apiRequest } from '@ui/api-client.ts';
import { orderQuery } from './get-order.ts';
import { ordersQuery } from './get-orders.ts';

const orderPath = (number: string) => `/orders/${encodeURIComponent(number)}`;

/** Opens a new payment page for an order whose card was declined or whose hold ran out. */
export const retryPayment = (number: string) =>
  apiRequest(`${orderPath(number)}/payment`, checkoutStartedResponse, { method: 'POST', body: {} });

export const cancelOrder = (number: string) =>
  apiRequest(`${orderPath(number)}/cancel`, null, { method: 'POST', body: {} });

export interface ProofAnswer {
  version: number;
  isApproved: boolean;
  answer: ProofAnswerRequest;
}

export const answerProof = (number: string, { version, isApproved, answer }: ProofAnswer) =>
  apiRequest(`${orderPath(number)}/proofs/${version}/${isApproved ? 'approval' : 'change-request'}`, null, {
    method: 'POST',
    body: answer,
  });

/** Refreshes the order and the list after it changed. */
function useOrderRefresh(number: string) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries(orderQuery(number)),
      queryClient.invalidateQueries({ queryKey: ordersQuery().queryKey, exact: true }),
    ]);
}

export const useRetryPayment = (number: string) => useMutation({ mutationFn: () => retryPayment(number) });

export function useCancelOrder(number: string) {
  const refresh = useOrderRefresh(number);
  return useMutation({ mutationFn: () => cancelOrder(number), onSuccess: refresh });
}

export function useAnswerProof(number: string) {
  const refresh = useOrderRefresh(number);
  return useMutation({ mutationFn: (answer: ProofAnswer) => answerProof(number, answer), onSuccess: refresh });
}
