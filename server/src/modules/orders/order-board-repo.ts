import type { Knex } from 'knex';
import type { Db } from '../../db/knex.ts';
import type {
  BoardOrder,
  BoardSortKey,
  DueOrdersQuery,
  OrderBoardQuery,
  OrderBoardResponse,
} from '../../contracts/studio-orders.ts';

/** A board row as read; the service adds its due date and whether it is overdue, by the shop's calendar. */
export type BoardOrderRow = Omit<BoardOrder, 'dueDate' | 'isOverdue'>;

/** Each sort, with the order id as the tie-break so a page boundary never repeats or skips an order. */
const sortColumns: Record<BoardSortKey, string> = {
  placed: 'o.placed_at',
  due: 'o.needed_by',
  total: 'o.total_cents',
  // An ENUM sorts by its position in the column definition, which is the order work flows.
  status: 'o.status',
  number: 'o.number',
};

/** Most customers a name search reaches: a search that matches more than this is too broad to read anyway. */
const MAX_MATCHED_CUSTOMERS = 500;

const isoDay = (value: Date | string | null): string | null =>
  value === null ? null : new Date(value).toISOString().slice(0, 10);

type Condition = (query: Knex.QueryBuilder) => void;

/**
 * The search box: an order number (or its digits) by prefix on the unique number index; otherwise customers by
 * the start of their e-mail or of any word of their name (FULLTEXT in boolean mode, `word*`). Neither needs a
 * leading-wildcard scan. Words under 3 letters are below InnoDB's FULLTEXT token size, so they use a name prefix.
 */
async function searchCondition(db: Db, q: string): Promise<Condition> {
  if (/^[A-Za-z]{2}-\d{0,10}$/.test(q)) return (query) => query.where('o.number', 'like', `${q.toUpperCase()}%`);
  if (/^\d{1,10}$/.test(q)) {
    const latest = await db('orders').orderBy('id', 'desc').first('number');
    const prefix = latest ? String(latest.number).split('-')[0] : '';
    return (query) => query.where('o.number', 'like', `${prefix}-${q}%`);
  }
  const escaped = q.replace(/[\\%_]/g, (c) => `\\${c}`);
  // Only letters and digits reach the FULLTEXT search, so its operators (+ - * " ~ < >) cannot be injected.
  const words = q.split(/[^\p{L}\p{N}]+/u).filter(Boolean);
  const longWords = words.filter((word) => [...word].length >= 3);
  // Two lookups rather than one OR, so each uses its own index (the e-mail's unique key, the name's FULLTEXT).
  const customers = () => db('users').where('role', 'customer').limit(MAX_MATCHED_CUSTOMERS);
  const byName =
    longWords.length > 0
      ? customers().whereRaw('MATCH(name) AGAINST (? IN BOOLEAN MODE)', [
          longWords.map((word) => `+${word}*`).join(' '),
        ])
      : words.length > 0
        ? customers().where('name', 'like', `${escaped}%`)
        : undefined;
  const found = await Promise.all([
    customers().where('email', 'like', `${escaped}%`).pluck('id'),
    byName?.pluck('id') ?? [],
  ]);
  const ids = [...new Set(found.flat() as number[])];
  return (query) => query.whereIn('o.customer_id', ids.length > 0 ? ids : [0]);
}

/** The board's filters on `orders as o`; the search is worked out first, as it may read the users table. */
async function boardFilters(
  db: Db,
  filters: Omit<OrderBoardQuery, 'sort' | 'dir' | 'page' | 'pageSize'>,
): Promise<Condition> {
  const search = filters.q ? await searchCondition(db, filters.q) : undefined;
  return (query) => {
    if (filters.status && filters.status.length > 0) query.whereIn('o.status', filters.status);
    if (filters.dueFrom) query.where('o.needed_by', '>=', filters.dueFrom);
    if (filters.dueTo) query.where('o.needed_by', '<=', filters.dueTo);
    if (filters.customer) query.where('o.customer_id', filters.customer);
    search?.(query);
  };
}

const boardColumns = [
  'o.id',
  'o.number',
  'o.status',
  'o.payment_status',
  'o.placed_at',
  'o.needed_by',
  'o.total_cents',
  'o.currency',
  'u.id as customer_id',
  'u.name as customer_name',
  'u.email as customer_email',
  'q.is_rush',
];

/** Full rows for orders already chosen (and ordered) by id: customer, rush flag and a one-line item summary. */
async function boardRows(db: Db, ids: number[]): Promise<BoardOrderRow[]> {
  if (ids.length === 0) return [];
  const [rows, items] = await Promise.all([
    db('orders as o')
      .join('users as u', 'u.id', 'o.customer_id')
      .join('quotes as q', 'q.id', 'o.quote_id')
      .whereIn('o.id', ids)
      .select(boardColumns),
    db('order_items').whereIn('order_id', ids).orderBy('id').select('order_id', 'quantity', 'description'),
  ]);
  const summaries = new Map<number, string[]>();
  for (const item of items)
    summaries.set(item.order_id, [...(summaries.get(item.order_id) ?? []), `${item.quantity} × ${item.description}`]);
  const byId = new Map(rows.map((row) => [row.id as number, row]));
  return ids.map((id) => {
    const row = byId.get(id)!;
    return {
      number: row.number,
      status: row.status,
      paymentStatus: row.payment_status,
      customer: { id: row.customer_id, name: row.customer_name, email: row.customer_email },
      placedAt: row.placed_at === null ? null : new Date(row.placed_at).toISOString(),
      neededBy: isoDay(row.needed_by),
      isRush: Boolean(row.is_rush),
      totalCents: Number(row.total_cents),
      currency: row.currency,
      itemSummary: (summaries.get(id) ?? []).join('; '),
    };
  });
}

/**
 * One page of the board. The page's ids are chosen first from `orders` alone (filters, sort and limit can use the
 * indexes), then only those rows are joined to their customer, quote and items: a deferred join, so a page costs
 * the same whether the shop has a hundred orders or fifty thousand.
 */
export async function listBoardOrders(
  db: Db,
  query: OrderBoardQuery,
): Promise<Omit<OrderBoardResponse, 'rows'> & { rows: BoardOrderRow[] }> {
  const { sort, dir, page, pageSize, ...filters } = query;
  const filter = await boardFilters(db, filters);
  const column = sortColumns[sort];
  const ordered = db('orders as o')
    .modify(filter)
    .select('o.id')
    .limit(pageSize)
    .offset((page - 1) * pageSize);
  // Orders without a date sort after those with one, whichever way the list runs. Descending, MariaDB puts NULL
  // last by itself, so the sort can read its index backwards; only ascending needs the extra (unindexed) key.
  if ((sort === 'due' || sort === 'placed') && dir === 'asc') ordered.orderByRaw(`${column} IS NULL`);
  // Within a status, newest first or last as the list runs: the (status, placed_at) index holds that order.
  const tieBreaks = sort === 'status' ? ['o.placed_at', 'o.id'] : ['o.id'];
  ordered.orderBy([column, ...tieBreaks].map((key) => ({ column: key, order: dir })));
  const [ids, [{ total }]] = await Promise.all([
    ordered.pluck('o.id') as Promise<number[]>,
    db('orders as o').modify(filter).count({ total: '*' }),
  ]);
  return { rows: await boardRows(db, ids), total: Number(total), page, pageSize };
}

/**
 * The calendar's candidates: open orders whose date asked for is in the range or already past (before `today` or
 * the range, whichever is earlier), and open orders with no date asked for, whose due date comes from the lead time
 * and is worked out by the service. Soonest asked-for date first.
 */
export async function listDueCandidates(db: Db, range: DueOrdersQuery, today: string): Promise<BoardOrderRow[]> {
  const open = [
    'authorized',
    'proof_sent',
    'changes_requested',
    'proof_approved',
    'in_production',
    'stitched',
  ] as const;
  const openOrders = () => db('orders as o').whereIn('o.status', open).limit(2000);
  // Two lookups, so the dated ones keep the needed_by index and the undated ones cannot crowd them out.
  const [dated, undated] = (await Promise.all([
    openOrders()
      .where((when) => {
        when
          .whereBetween('o.needed_by', [range.from, range.to])
          .orWhere('o.needed_by', '<', today < range.from ? today : range.from);
      })
      .orderBy([{ column: 'o.needed_by' }, { column: 'o.id' }])
      .pluck('o.id'),
    openOrders().whereNull('o.needed_by').whereNotNull('o.placed_at').orderBy('o.placed_at').pluck('o.id'),
  ])) as [number[], number[]];
  return boardRows(db, [...dated, ...undated]);
}
