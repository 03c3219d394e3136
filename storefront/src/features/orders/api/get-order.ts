import { queryOptions, useQuery } from '@tanstack/react-query';
import { customerOrderResponse, type CustomerOrderResponse } from '@server/contracts/orders.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getOrder = (number: string) => apiRequest(`/orders/${encodeURIComponent(number)}`, customerOrderResponse);

export const orderQuery = (number: string) => queryOptions({ queryKey: ['orders', number], queryFn: () => getOrder(number) });

/** How often to look again while the payment provider's confirmation is on its way. */
const PAYMENT_POLL_MS = 1_500;

/** One of the customer's orders; `isAwaitingWebhook` polls while the order still waits for its payment to land. */
export function useOrder(number: string, options: { isAwaitingWebhook?: boolean } = {}) {
  return useQuery({
    ...orderQuery(number),
    refetchInterval: (query) => {
      const data = query.state.data as CustomerOrderResponse | undefined;
      return options.isAwaitingWebhook && data?.order.status === 'awaiting_payment' && !data.payment.failureMessage ? PAYMENT_POLL_MS : false;
    },
  });
}
