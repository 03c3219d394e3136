import { Link } from 'react-router-dom';
import { ApiError } from '@ui/api-client.ts';
import { EmptyState, ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { formatMoney, formatCustomerDate } from '@ui/format.ts';
import { useOrders } from '../../features/orders/api/get-orders.ts';
import { OrderStatusBadge } from '../../features/orders/components/order-status-badge.tsx';
import { SignInNeeded } from '../../components/sign-in-needed.tsx';
import { paths } from '../../config/paths.ts';

export function OrdersPage() {
  const orders = useOrders();
  if (orders.isPending) return <Loading label="Finding your orders…" />;
  if (orders.isError) {
    if (orders.error instanceof ApiError && orders.error.kind === 'unauthenticated')
      return <SignInNeeded message="Sign in to see your orders." returnTo={paths.orders.href()} />;
    return <ErrorNotice message={orders.error.message} onRetry={() => void orders.refetch()} />;
  }
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-semibold sm:text-3xl">Your orders</h1>
      {orders.data.length === 0 ? (
        <EmptyState title="No orders yet">
          Design a garment and order it from the designer.{' '}
          <Link to={paths.home.href()} className="text-madder-600 underline">
            Choose a garment
          </Link>
        </EmptyState>
      ) : (
        <ul className="space-y-3">
          {orders.data.map((order) => (
            <li key={order.number}>
              <Link
                to={paths.order.href(order.number)}
                className={`block rounded-card border bg-white p-4 shadow-sm hover:border-madder-500 ${order.isWaitingOnCustomer ? 'border-saffron-500' : 'border-linen-200'}`}
              >
                <div className="flex flex-wrap items-center justify-between gap-2">
                  <span className="font-semibold">
                    {order.number} · {order.designName}
                  </span>
                  <OrderStatusBadge status={order.status} />
                </div>
                <p className="mt-1 text-sm text-walnut-700">
                  {order.garmentName} · {formatMoney(order.totalCents, order.currency)} · ordered{' '}
                  {formatCustomerDate(order.createdAt)}
                </p>
                {order.isWaitingOnCustomer && (
                  <p className="mt-1 text-sm font-medium text-madder-700">
                    {order.status === 'awaiting_payment'
                      ? 'Waiting for your payment'
                      : 'Your proof is ready to look at'}
                  </p>
                )}
              </Link>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
