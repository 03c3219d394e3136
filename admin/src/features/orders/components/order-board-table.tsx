import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import type { BoardOrder, BoardSortKey, OrderBoardQuery } from '@server/contracts/studio-orders.ts';
import { formatMoney, formatStudioDate } from '@ui/format.ts';
import { paths } from '../../../config/paths.ts';
import { statusLabels } from '../../../lib/order-status-labels.ts';
import { DueFlags, formatDueDay } from './order-badges.tsx';

const column = createColumnHelper<BoardOrder>();

/** What the cells may ask of the board. */
interface BoardMeta {
  onCustomer: (customerId: number) => void;
}

const columns = [
  column.accessor('number', {
    id: 'number',
    header: 'Order',
    cell: (info) => (
      <Link
        to={paths.order.href(info.getValue())}
        className="font-medium text-madder-700 underline-offset-2 hover:underline"
      >
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor('placedAt', {
    id: 'placed',
    header: 'Placed',
    cell: (info) => (info.getValue() ? formatStudioDate(info.getValue()!) : 'Not paid yet'),
  }),
  column.accessor((order) => order.customer.name, {
    id: 'customer',
    header: 'Customer',
    enableSorting: false,
    cell: (info) => {
      const { customer } = info.row.original;
      const onCustomer = (info.table.options.meta as BoardMeta | undefined)?.onCustomer;
      return (
        <span>
          <button
            type="button"
            onClick={() => onCustomer?.(customer.id)}
            title={`Only ${customer.name}’s orders`}
            className="text-left underline-offset-2 hover:underline"
          >
            {info.getValue()}
          </button>
          <span className="block text-xs text-walnut-500">{customer.email}</span>
        </span>
      );
    },
  }),
  column.accessor('status', { id: 'status', header: 'Where it stands', cell: (info) => statusLabels[info.getValue()] }),
  column.accessor('dueDate', {
    id: 'due',
    header: 'Due',
    cell: (info) => (
      <span className="whitespace-nowrap">
        {info.getValue() ? formatDueDay(info.getValue()!) : '—'}
        {info.getValue() && !info.row.original.neededBy && <span className="text-walnut-500"> (lead time)</span>}
        <DueFlags order={info.row.original} />
      </span>
    ),
  }),
  column.accessor('itemSummary', {
    id: 'items',
    header: 'What to make',
    enableSorting: false,
    cell: (info) => <span className="line-clamp-2">{info.getValue()}</span>,
  }),
  column.accessor('totalCents', {
    id: 'total',
    header: 'Total',
    cell: (info) => <span className="tabular-nums">{formatMoney(info.getValue(), info.row.original.currency)}</span>,
  }),
];

const sortable = new Set<string>(['number', 'placed', 'status', 'due', 'total'] satisfies BoardSortKey[]);

/**
 * The board as a table (sorting by the server: the header buttons write the sort into the URL) and, at phone
 * width, as one card per order with the same facts.
 */
export function OrderBoardTable({
  rows,
  query,
  onSort,
  onCustomer,
}: {
  rows: BoardOrder[];
  query: OrderBoardQuery;
  onSort: (sort: BoardSortKey, dir: 'asc' | 'desc') => void;
  onCustomer: (customerId: number) => void;
}) {
  const sorting = useMemo<SortingState>(
    () => [{ id: query.sort, desc: query.dir === 'desc' }],
    [query.sort, query.dir],
  );
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting },
    manualSorting: true,
    getCoreRowModel: getCoreRowModel(),
    meta: { onCustomer } satisfies BoardMeta,
  });
  const sortBy = (id: string) =>
    onSort(
      id as BoardSortKey,
      query.sort === id && query.dir === 'asc'
        ? 'desc'
        : query.sort === id
          ? 'asc'
          : id === 'due' || id === 'number'
            ? 'asc'
            : 'desc',
    );

  return (
    <>
      <table className="hidden w-full text-left text-sm md:table">
        <thead className="text-walnut-500">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const isSorted = query.sort === header.column.id;
                const label = flexRender(header.column.columnDef.header, header.getContext());
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={isSorted ? (query.dir === 'asc' ? 'ascending' : 'descending') : undefined}
                    className={`py-2 pr-3 font-medium ${header.column.id === 'total' ? 'text-right' : ''}`}
                  >
                    {sortable.has(header.column.id) ? (
                      <button
                        type="button"
                        onClick={() => sortBy(header.column.id)}
                        className="inline-flex items-center gap-1 rounded hover:text-walnut-900"
                      >
                        {label}
                        <span aria-hidden="true" className={isSorted ? 'text-madder-600' : 'text-linen-300'}>
                          {isSorted && query.dir === 'asc' ? '▲' : '▼'}
                        </span>
                      </button>
                    ) : (
                      label
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-t border-linen-200 align-top hover:bg-linen-50">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className={`py-2.5 pr-3 ${cell.column.id === 'total' ? 'text-right' : ''}`}>
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <ul className="grid gap-3 md:hidden" aria-label="Orders">
        {rows.map((order) => (
          <li key={order.number} className="rounded-lg border border-linen-200 p-3 text-sm">
            <div className="flex items-baseline justify-between gap-2">
              <Link
                to={paths.order.href(order.number)}
                className="text-base font-semibold text-madder-700 underline-offset-2 hover:underline"
              >
                {order.number}
              </Link>
              <span className="tabular-nums">{formatMoney(order.totalCents, order.currency)}</span>
            </div>
            <p>
              {order.customer.name} · {statusLabels[order.status]}
            </p>
            <p className="text-walnut-500">
              {order.neededBy
                ? `Needed by ${formatDueDay(order.neededBy)}`
                : order.dueDate
                  ? `Due ${formatDueDay(order.dueDate)} (lead time)`
                  : 'No date yet'}
              <DueFlags order={order} />
            </p>
            <p className="mt-1 text-walnut-700">{order.itemSummary}</p>
          </li>
        ))}
      </ul>
    </>
  );
}
