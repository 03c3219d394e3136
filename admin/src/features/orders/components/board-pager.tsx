import type { BoardSortKey, OrderBoardQuery } from '@server/contracts/studio-orders.ts';

const sortNames: Record<BoardSortKey, string> = {
  placed: 'Placed',
  due: 'Needed by',
  total: 'Total',
  status: 'Where it stands',
  number: 'Order number',
};
const pageSizes = [25, 50, 100];
const select = 'min-h-10 rounded-lg border border-linen-300 bg-white px-2 text-sm';
const pagerButton =
  'min-h-10 rounded-full border border-linen-300 bg-white px-4 text-sm hover:bg-linen-100 disabled:opacity-50';

/** Which orders of how many are shown, the way to the next and previous page, and (for phones) the sort. */
export function BoardPager({
  query,
  total,
  onChange,
}: {
  query: OrderBoardQuery;
  total: number;
  onChange: (changes: Partial<OrderBoardQuery>) => void;
}) {
  const lastPage = Math.max(1, Math.ceil(total / query.pageSize));
  const first = total === 0 ? 0 : (query.page - 1) * query.pageSize + 1;
  const last = Math.min(total, query.page * query.pageSize);
  return (
    <div className="flex flex-wrap items-center justify-between gap-3 text-sm">
      <p aria-live="polite">
        {total === 0 ? 'No orders' : `Orders ${first}–${last} of ${total.toLocaleString('en-US')}`}
      </p>
      <div className="flex flex-wrap items-center gap-2">
        <label className="flex items-center gap-2 md:hidden">
          Sort
          <select
            className={select}
            value={`${query.sort}:${query.dir}`}
            onChange={(event) => {
              const [sort, dir] = event.target.value.split(':') as [BoardSortKey, 'asc' | 'desc'];
              onChange({ sort, dir });
            }}
          >
            {(Object.keys(sortNames) as BoardSortKey[]).flatMap((key) => [
              <option key={`${key}:desc`} value={`${key}:desc`}>
                {sortNames[key]} ↓
              </option>,
              <option key={`${key}:asc`} value={`${key}:asc`}>
                {sortNames[key]} ↑
              </option>,
            ])}
          </select>
        </label>
        <label className="flex items-center gap-2">
          Per page
          <select
            className={select}
            value={query.pageSize}
            onChange={(event) => onChange({ pageSize: Number(event.target.value) })}
          >
            {pageSizes.map((size) => (
              <option key={size} value={size}>
                {size}
              </option>
            ))}
          </select>
        </label>
        <button
          type="button"
          className={pagerButton}
          disabled={query.page <= 1}
          onClick={() => onChange({ page: query.page - 1 })}
        >
          Previous
        </button>
        <span className="tabular-nums">
          Page {query.page} of {lastPage}
        </span>
        <button
          type="button"
          className={pagerButton}
          disabled={query.page >= lastPage}
          onClick={() => onChange({ page: query.page + 1 })}
        >
          Next
        </button>
      </div>
    </div>
  );
}
