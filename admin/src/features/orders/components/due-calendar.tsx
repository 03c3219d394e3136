import { Link } from 'react-router-dom';
import type { BoardOrder } from '@server/contracts/studio-orders.ts';
import { EmptyState, ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { paths } from '../../../config/paths.ts';
import { statusLabels } from '../../../lib/order-status-labels.ts';
import { useDueOrders } from '../api/get-due-orders.ts';
import { calendarRange } from '../model/calendar-range.ts';
import { DueFlags, formatDueDay } from './order-badges.tsx';

const WEEKS = 6;
const weekdays = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'];
const monthName = new Intl.DateTimeFormat('en-US', { month: 'short', timeZone: 'UTC' });

function OrderChip({ order }: { order: BoardOrder }) {
  const tone = order.isOverdue
    ? 'border-madder-500 bg-madder-50'
    : order.isRush
      ? 'border-saffron-500 bg-saffron-100'
      : 'border-linen-300 bg-white';
  return (
    <li>
      <Link
        to={paths.order.href(order.number)}
        className={`block overflow-hidden rounded-md border px-1.5 py-1 text-xs leading-tight hover:border-walnut-700 ${tone}`}
      >
        <span className="font-semibold">{order.number}</span>
        <span className="block truncate text-walnut-700">
          {order.customer.name.split(' ')[0]} · {statusLabels[order.status]}
        </span>
        {(order.isRush || order.isOverdue) && (
          <span className="block">
            <DueFlags order={order} />
          </span>
        )}
      </Link>
    </li>
  );
}

/**
 * The next weeks as a calendar of due dates: each open order on the day it is due (asked for, or by the lead time),
 * rush orders in saffron and
 * overdue ones in madder, with orders already late gathered above the weeks. At phone width, a list of the days
 * that have orders.
 */
export function DueCalendar({ nowMs, timeZone }: { nowMs: number; timeZone: string }) {
  const { from, to, days } = calendarRange(nowMs, WEEKS, timeZone);
  const due = useDueOrders(from, to);
  if (due.isPending) return <Loading label="Laying out the weeks…" />;
  if (due.isError) return <ErrorNotice message={due.error.message} onRetry={() => void due.refetch()} />;
  const byDay = new Map<string, BoardOrder[]>();
  for (const order of due.data.orders)
    if (order.dueDate && order.dueDate >= from) byDay.set(order.dueDate, [...(byDay.get(order.dueDate) ?? []), order]);
  const late = due.data.orders.filter((order) => order.dueDate && order.dueDate < from);
  const busyDays = days.filter((day) => byDay.has(day));

  return (
    <div className="grid gap-4">
      {late.length > 0 && (
        <section
          aria-label="Overdue before these weeks"
          className="rounded-lg border border-madder-500/40 bg-madder-50 p-3"
        >
          <h3 className="mb-2 text-sm font-semibold text-madder-700">Already late ({late.length})</h3>
          <ul className="flex flex-wrap gap-2">
            {late.map((order) => (
              <OrderChip key={order.number} order={order} />
            ))}
          </ul>
        </section>
      )}
      {due.data.orders.length === 0 && (
        <EmptyState title="Nothing is due in the next six weeks.">
          Orders with a needed-by date appear here on their day.
        </EmptyState>
      )}
      <div
        className="hidden md:block"
        role="table"
        aria-label={`Orders due from ${formatDueDay(from)} to ${formatDueDay(to)}`}
      >
        <div role="row" className="grid grid-cols-7 gap-1 text-xs font-medium text-walnut-500">
          {weekdays.map((name) => (
            <span role="columnheader" key={name} className="px-1">
              {name}
            </span>
          ))}
        </div>
        {Array.from({ length: WEEKS }, (_, week) => (
          <div role="row" key={week} className="mt-1 grid grid-cols-7 gap-1">
            {days.slice(week * 7, week * 7 + 7).map((day) => {
              const isToday = day === due.data.today;
              const isPast = day < due.data.today;
              return (
                <div
                  role="cell"
                  key={day}
                  aria-label={formatDueDay(day)}
                  className={`min-h-24 min-w-0 rounded-md border p-1 ${isToday ? 'border-madder-500 ring-1 ring-madder-500' : 'border-linen-200'} ${isPast ? 'bg-linen-100' : 'bg-white'}`}
                >
                  <p className={`text-xs ${isToday ? 'font-semibold text-madder-700' : 'text-walnut-500'}`}>
                    {isToday
                      ? 'Today'
                      : `${Number(day.slice(8))}${day.endsWith('-01') ? ` ${monthName.format(new Date(`${day}T12:00:00Z`))}` : ''}`}
                  </p>
                  <ul className="mt-1 grid gap-1">
                    {(byDay.get(day) ?? []).map((order) => (
                      <OrderChip key={order.number} order={order} />
                    ))}
                  </ul>
                </div>
              );
            })}
          </div>
        ))}
      </div>
      <ol className="grid gap-3 md:hidden" aria-label="Days with orders due">
        {busyDays.map((day) => (
          <li key={day}>
            <h3 className="text-sm font-semibold">{day === due.data.today ? 'Today' : formatDueDay(day)}</h3>
            <ul className="mt-1 grid gap-1">
              {byDay.get(day)!.map((order) => (
                <OrderChip key={order.number} order={order} />
              ))}
            </ul>
          </li>
        ))}
      </ol>
    </div>
  );
}
