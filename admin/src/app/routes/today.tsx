import { lazy, Suspense } from 'react';
import { Link } from 'react-router-dom';
import { EmptyState, ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { paths } from '../../config/paths.ts';
import { formatMoney } from '@ui/format.ts';
import { useOverview } from '../../features/overview/api/get-overview.ts';
import { StatusStrip } from '../../features/overview/components/status-strip.tsx';
import { ActionGroups } from '../../features/overview/components/action-groups.tsx';

// The charting library is most of the studio app's weight, so the charts load in their own chunk.
const MachineHoursChart = lazy(() =>
  import('../../features/overview/components/machine-hours-chart.tsx').then((m) => ({ default: m.MachineHoursChart })),
);
const RevenueChart = lazy(() =>
  import('../../features/overview/components/revenue-chart.tsx').then((m) => ({ default: m.RevenueChart })),
);
import { statusLabels } from '../../lib/order-status-labels.ts';

const dateFormat = new Intl.DateTimeFormat('en-US', { month: 'short', day: 'numeric' });

export function TodayPage() {
  const overview = useOverview();
  if (overview.isPending) return <Loading label="Gathering today's work…" />;
  if (overview.isError) return <ErrorNotice message={overview.error.message} onRetry={() => void overview.refetch()} />;
  const { shopName, countsByStatus, recentOrders, actions, machineHours, revenue, today } = overview.data;
  return (
    <div className="grid min-w-0 gap-6">
      <div>
        <h1 className="text-2xl font-semibold">{shopName}</h1>
        <p className="text-sm text-walnut-500">
          Today, {dateFormat.format(new Date(`${today}T12:00:00Z`))}: what needs a hand
        </p>
      </div>
      <ActionGroups groups={actions} orderHref={paths.order.href} />
      <div className="grid min-w-0 gap-6 lg:grid-cols-2">
        <section
          aria-labelledby="machine-hours-heading"
          className="min-w-0 rounded-card border border-linen-200 bg-white p-5"
        >
          <h2 id="machine-hours-heading" className="text-lg font-semibold">
            Machine hours booked
          </h2>
          <p className="mb-3 text-sm text-walnut-500">
            Orders not yet stitched, in the week they are due (the customer’s date, or {machineHours.leadTimeDays}{' '}
            working days after ordering), against {machineHours.capacityHours} h a week.
          </p>
          <Suspense fallback={<Loading label="Drawing the chart…" />}>
            <MachineHoursChart machineHours={machineHours} />
          </Suspense>
        </section>
        <section
          aria-labelledby="revenue-heading"
          className="min-w-0 rounded-card border border-linen-200 bg-white p-5"
        >
          <h2 id="revenue-heading" className="text-lg font-semibold">
            Takings by week
          </h2>
          <p className="mb-3 text-sm text-walnut-500">Cards charged, less refunds, in the week the money moved.</p>
          <Suspense fallback={<Loading label="Drawing the chart…" />}>
            <RevenueChart revenue={revenue} />
          </Suspense>
        </section>
      </div>
      <div className="grid min-w-0 gap-6 lg:grid-cols-[22rem_1fr]">
        <section className="min-w-0 rounded-card border border-linen-200 bg-white p-5">
          <h2 className="text-lg font-semibold">Where every order stands</h2>
          <p className="mb-4 text-sm text-walnut-500">All orders by status</p>
          <StatusStrip counts={countsByStatus} />
        </section>
        <section className="min-w-0 rounded-card border border-linen-200 bg-white p-5">
          <h2 className="mb-3 text-lg font-semibold">Latest orders</h2>
          {recentOrders.length === 0 ? (
            <EmptyState title="No orders yet.">New orders appear here as soon as a customer's card is held.</EmptyState>
          ) : (
            <div className="overflow-x-auto">
              <table className="w-full min-w-[36rem] text-left text-sm">
                <thead className="text-walnut-500">
                  <tr>
                    <th className="py-1.5 font-medium">Order</th>
                    <th className="py-1.5 font-medium">Customer</th>
                    <th className="py-1.5 font-medium">Where it stands</th>
                    <th className="py-1.5 font-medium">Needed by</th>
                    <th className="py-1.5 text-right font-medium">Total</th>
                  </tr>
                </thead>
                <tbody>
                  {recentOrders.map((order) => (
                    <tr key={order.id} className="border-t border-linen-200">
                      <td className="py-2 font-medium">
                        <Link
                          to={paths.order.href(order.number)}
                          className="text-madder-700 underline-offset-2 hover:underline"
                        >
                          {order.number}
                        </Link>
                      </td>
                      <td className="py-2">{order.customerName}</td>
                      <td className="py-2">{statusLabels[order.status]}</td>
                      <td className="py-2">
                        {order.neededBy ? dateFormat.format(new Date(`${order.neededBy}T12:00:00Z`)) : '—'}
                      </td>
                      <td className="py-2 text-right tabular-nums">{formatMoney(order.totalCents, order.currency)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
        </section>
      </div>
    </div>
  );
}
