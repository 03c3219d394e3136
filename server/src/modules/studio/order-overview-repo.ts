import type { Db } from '../../db/knex.ts';
import type { AdminOverviewResponse, OrderStatus } from '../../contracts/admin-overview.ts';

const isoDate = (value: Date | string | null): string | null =>
  value === null ? null : value instanceof Date ? value.toISOString() : String(value);

/** Order counts per status and the most recently placed orders, for the studio's home screen. */
export async function readOrderOverview(
  db: Db,
  recentLimit: number,
): Promise<Pick<AdminOverviewResponse, 'shopName' | 'countsByStatus' | 'recentOrders'>> {
  const [shop, counts, recent] = await Promise.all([
    db('shop_settings').select('name').where({ id: 1 }).first(),
    db('orders').select('status').count({ n: '*' }).groupBy('status') as Promise<
      { status: string; n: number | string }[]
    >,
    db('orders as o')
      .join('users as u', 'u.id', 'o.customer_id')
      .select(
        'o.id',
        'o.number',
        'u.name as customer_name',
        'o.status',
        'o.total_cents',
        'o.currency',
        'o.needed_by',
        'o.placed_at',
      )
      .orderBy([
        { column: 'o.placed_at', order: 'desc' },
        { column: 'o.id', order: 'desc' },
      ])
      .limit(recentLimit),
  ]);
  return {
    shopName: shop?.name ?? 'Your studio',
    countsByStatus: Object.fromEntries(counts.map((row) => [row.status as string, Number(row.n)])),
    recentOrders: recent.map((row) => ({
      id: row.id,
      number: row.number,
      customerName: row.customer_name,
      status: row.status as OrderStatus,
      totalCents: Number(row.total_cents),
      currency: row.currency,
      neededBy: row.needed_by ? isoDate(row.needed_by)!.slice(0, 10) : null,
      placedAt: isoDate(row.placed_at),
    })),
  };
}
