import { Link } from 'react-router-dom';
import type { ActionGroupKind, AdminOverviewResponse } from '@server/contracts/admin-overview.ts';
import { formatMoney, formatStudioDate } from '@ui/format.ts';
import { statusLabels } from '../../../lib/order-status-labels.ts';

const groupText: Record<ActionGroupKind, { title: string; empty: string }> = {
  pictures_to_digitize: {
    title: 'Pictures to digitize',
    empty: 'Every customer’s picture has its stitch file.',
  },
  proofs_to_send: { title: 'Proofs to send', empty: 'Every paid order has its proof.' },
  changes_asked: { title: 'Changes asked for', empty: 'No customer is waiting on a change.' },
  awaiting_charge: { title: 'Approved, ready to charge', empty: 'Nothing approved is waiting to be charged.' },
  due_soon: { title: 'Due within a week', empty: 'Nothing is due in the next seven days.' },
  ready_to_ship: { title: 'Stitched, ready to ship', empty: 'Nothing is waiting to be packed.' },
};

const dayOf = formatStudioDate;

/** What needs a hand today, one card per kind of work, each order a link to its page. */
export function ActionGroups({
  groups,
  orderHref,
}: {
  groups: AdminOverviewResponse['actions'];
  orderHref: (number: string) => string;
}) {
  return (
    <div className="grid gap-4 sm:grid-cols-2 xl:grid-cols-3">
      {groups.map((group) => (
        <section
          key={group.kind}
          aria-labelledby={`action-${group.kind}`}
          className="min-w-0 rounded-card border border-linen-200 bg-white p-4"
        >
          <h3 id={`action-${group.kind}`} className="flex items-baseline justify-between gap-2 font-semibold">
            {groupText[group.kind].title}
            <span
              className={`rounded-full px-2 text-sm tabular-nums ${group.orders.length ? 'bg-madder-600 text-white' : 'bg-linen-100 text-walnut-500'}`}
            >
              {group.orders.length}
            </span>
          </h3>
          {group.orders.length === 0 ? (
            <p className="mt-2 text-sm text-walnut-500">{groupText[group.kind].empty}</p>
          ) : (
            <ul className="mt-2 grid gap-2 text-sm">
              {group.orders.map((order) => (
                <li key={order.id} className="grid">
                  <span className="flex flex-wrap items-baseline justify-between gap-x-2">
                    <Link
                      to={orderHref(order.number)}
                      className="font-medium text-madder-700 underline-offset-2 hover:underline"
                    >
                      {order.number}
                    </Link>
                    <span className="tabular-nums text-walnut-500">
                      {formatMoney(order.totalCents, order.currency)}
                    </span>
                  </span>
                  <span className="text-walnut-700">{order.customerName}</span>
                  {group.kind === 'due_soon' && <span className="text-walnut-500">{statusLabels[order.status]}</span>}
                  {order.dueDate && (
                    <span className={order.isOverdue ? 'font-semibold text-madder-700' : 'text-walnut-500'}>
                      {order.isOverdue ? 'Overdue since ' : 'Due '}
                      {dayOf(order.dueDate)}
                      {order.neededBy ? '' : ' (lead time)'}
                    </span>
                  )}
                </li>
              ))}
            </ul>
          )}
        </section>
      ))}
    </div>
  );
}
