import { EmptyState, ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { useOrderBoard } from '../../features/orders/api/get-order-board.ts';
import { BoardFilters } from '../../features/orders/components/board-filters.tsx';
import { BoardPager } from '../../features/orders/components/board-pager.tsx';
import { DueCalendar } from '../../features/orders/components/due-calendar.tsx';
import { OrderBoardTable } from '../../features/orders/components/order-board-table.tsx';
import { useBoardQuery } from '../../features/orders/hooks/use-board-query.ts';
import { useSettings } from '../../features/settings/api/get-settings.ts';

function ViewSwitch({ view, onChange }: { view: 'list' | 'calendar'; onChange: (view: 'list' | 'calendar') => void }) {
  const option = (value: 'list' | 'calendar', label: string) => (
    <button
      type="button"
      aria-pressed={view === value}
      onClick={() => onChange(value)}
      className={`min-h-10 rounded-full px-4 text-sm ${view === value ? 'bg-walnut-900 text-linen-100' : 'text-walnut-700 hover:bg-linen-100'}`}
    >
      {label}
    </button>
  );
  return (
    <div
      role="group"
      aria-label="Show the orders as"
      className="flex gap-1 rounded-full border border-linen-300 bg-white p-1"
    >
      {option('list', 'List')}
      {option('calendar', 'Due dates')}
    </div>
  );
}

/** Every order the studio has: filtered, searched, sorted and paged by the server, or laid out by due date. */
export function OrdersPage() {
  const { query, view, update, setView } = useBoardQuery();
  const board = useOrderBoard(query);
  // The shop's time zone: the calendar's weeks are the shop's, as its due dates are.
  const settings = useSettings();
  return (
    <div className="grid gap-5">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-semibold">Orders</h1>
        <ViewSwitch view={view} onChange={setView} />
      </div>
      {view === 'calendar' ? (
        <section className="min-w-0 rounded-card border border-linen-200 bg-white p-4">
          {settings.data ? (
            <DueCalendar nowMs={Date.now()} timeZone={settings.data.settings.timeZone} />
          ) : settings.isError ? (
            <ErrorNotice message={settings.error.message} onRetry={() => void settings.refetch()} />
          ) : (
            <Loading label="Laying out the weeks…" />
          )}
        </section>
      ) : (
        <section className="grid min-w-0 gap-4 rounded-card border border-linen-200 bg-white p-4">
          <BoardFilters query={query} onChange={update} />
          {board.isPending ? (
            <Loading label="Fetching the orders…" />
          ) : board.isError ? (
            <ErrorNotice message={board.error.message} onRetry={() => void board.refetch()} />
          ) : board.data.total === 0 ? (
            <EmptyState title="No orders match.">
              Try fewer status chips, a wider date range or another search.
            </EmptyState>
          ) : (
            <div
              className={`grid gap-4 transition-opacity ${board.isPlaceholderData ? 'opacity-60' : ''}`}
              aria-busy={board.isFetching}
            >
              {query.customer && board.data.rows[0] && (
                <p className="flex flex-wrap items-center gap-2 text-sm">
                  Only the orders of <strong>{board.data.rows[0].customer.name}</strong>
                  <button
                    type="button"
                    onClick={() => update({ customer: undefined })}
                    className="rounded-full border border-linen-300 px-3 py-1 hover:bg-linen-100"
                  >
                    Show every customer
                  </button>
                </p>
              )}
              <OrderBoardTable
                rows={board.data.rows}
                query={query}
                onSort={(sort, dir) => update({ sort, dir })}
                onCustomer={(customer) => update({ customer })}
              />
              <BoardPager query={query} total={board.data.total} onChange={update} />
            </div>
          )}
        </section>
      )}
    </div>
  );
}
