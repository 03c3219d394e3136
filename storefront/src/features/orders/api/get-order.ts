import { queryOptions, useQuery } from '@tanstack/react-query';
import { customerOrderResponse, type CustomerOrderResponse } from '@server/contracts/orders.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getOrder = (number: string) => apiRequest(`/orders/${encodeURIComponent(number)}`, customerOrderResponse);

export const orderQuery = (number: string) =>
  queryOptions({ queryKey: ['orders', number], queryFn: () => getOrder(number) });

/** How often to look again while the payment provider's word is on its way, and for how long at most (about 1 min). */
const PAYMENT_POLL_MS = 1_500;
const MAX_PAYMENT_POLLS = 40;

/**
 * One of the customer's orders. Just back from the payment page (`isBackFromPayment`), it looks again until the
 * provider's webhook has landed: the card held, or the reason it was not.
 */
export function useOrder(number: string, options: { isBackFromPayment?: boolean } = {}) {
  return useQuery({
    ...orderQuery(number),
    refetchInterval: (query) => {
      const data = query.state.data as CustomerOrderResponse | undefined;
      const isWaiting = data?.order.status === 'awaiting_payment' && !data.payment.failureMessage;
      return options.isBackFromPayment && isWaiting && query.state.dataUpdateCount < MAX_PAYMENT_POLLS
        ? PAYMENT_POLL_MS
        : false;
    },
  });
}
