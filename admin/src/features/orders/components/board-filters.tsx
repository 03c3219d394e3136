import { useEffect, useState } from 'react';
import { orderStatuses, type OrderStatus } from '@server/contracts/order-status.ts';
import type { OrderBoardQuery } from '@server/contracts/studio-orders.ts';
import { statusLabels } from '../../../lib/order-status-labels.ts';

const SEARCH_DELAY_MS = 300;

const field =
  'min-h-11 rounded-lg border border-linen-300 bg-white px-3 text-sm focus:border-madder-500 focus:outline-none focus:ring-2 focus:ring-madder-500/30';

/** Status chips, the due-date range and the search box; each change goes straight into the URL. */
export function BoardFilters({
  query,
  onChange,
}: {
  query: OrderBoardQuery;
  onChange: (changes: Partial<OrderBoardQuery>) => void;
}) {
  const [search, setSearch] = useState(query.q ?? '');
  useEffect(() => setSearch(query.q ?? ''), [query.q]);
  useEffect(() => {
    if (search.trim() === (query.q ?? '')) return;
    const timer = setTimeout(() => onChange({ q: search.trim() || undefined }), SEARCH_DELAY_MS);
    return () => clearTimeout(timer);
  }, [search, query.q, onChange]);

  const chosen = query.status ?? [];
  const toggle = (status: OrderStatus) => {
    const next = chosen.includes(status) ? chosen.filter((s) => s !== status) : [...chosen, status];
    onChange({ status: next.length > 0 ? next : undefined });
  };
  const hasFilters = chosen.length > 0 || query.dueFrom || query.dueTo || query.q || query.customer;

  return (
    <div className="grid gap-3">
      <div className="flex flex-wrap items-end gap-3">
        <label className="grid min-w-0 flex-1 basis-64 gap-1 text-sm">
          <span className="font-medium">Search</span>
          <input
            type="search"
            value={search}
            onChange={(event) => setSearch(event.target.value)}
            placeholder="Order number, customer name or e-mail"
            className={field}
          />
        </label>
        <label className="grid gap-1 text-sm">
          <span className="font-medium">Due from</span>
          <input
            type="date"
            value={query.dueFrom ?? ''}
            max={query.dueTo}
            onChange={(event) => onChange({ dueFrom: event.target.value || undefined })}
            className={field}
          />
        </label>
        <label className="grid gap-1 text-sm">
          <span className="font-medium">Due by</span>
          <input
            type="date"
            value={query.dueTo ?? ''}
            min={query.dueFrom}
            onChange={(event) => onChange({ dueTo: event.target.value || undefined })}
            className={field}
          />
        </label>
        {hasFilters && (
          <button
            type="button"
            onClick={() =>
              onChange({ status: undefined, dueFrom: undefined, dueTo: undefined, q: undefined, customer: undefined })
            }
            className="min-h-11 rounded-full px-4 text-sm text-madder-700 underline-offset-2 hover:underline"
          >
            Clear filters
          </button>
        )}
      </div>
      <div role="group" aria-label="Show orders that are" className="flex flex-wrap gap-2">
        {orderStatuses.map((status) => {
          const isOn = chosen.includes(status);
          return (
            <button
              key={status}
              type="button"
              aria-pressed={isOn}
              onClick={() => toggle(status)}
              className={`min-h-9 rounded-full border px-3 py-1 text-sm transition-colors ${isOn ? 'border-walnut-900 bg-walnut-900 text-linen-100' : 'border-linen-300 bg-white text-walnut-700 hover:bg-linen-100'}`}
            >
              {statusLabels[status]}
            </button>
          );
        })}
      </div>
    </div>
  );
}
