import { useMutation, useQueryClient } from '@tanstack/react-query';
import { checkoutStartedResponse, type PlaceOrderRequest } from '@server/contracts/orders.ts';
import { apiRequest } from '@ui/api-client.ts';

/** Places the order from a stored quote; the answer is the payment page to go to. */
export const placeOrder = (request: PlaceOrderRequest) =>
  apiRequest('/orders', checkoutStartedResponse, { method: 'POST', body: request });

export function usePlaceOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: placeOrder,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['orders'] }),
  });
}
