import type { Db } from '../../db/knex.ts';
import { openOrderStatuses } from '../../contracts/order-status.ts';
import type { OrderStatus } from '../../contracts/order-status.ts';

/** Money that moved at one instant: a capture, or a refund (a positive amount either way). */
export interface MoneyMovement {
  at: Date;
  amountCents: number;
}

export interface OpenOrderRow {
  id: number;
  number: string;
  customerName: string;
  status: OrderStatus;
  totalCents: number;
  currency: string;
  neededBy: string | null;
  placedAt: Date | null;
  /** The quote's machine minutes for the whole quantity. */
  runMinutes: number;
}

const dateOnly = (value: Date | string | null): string | null =>
  value === null ? null : value instanceof Date ? value.toISOString().slice(0, 10) : String(value).slice(0, 10);

/** Orders that are placed and not yet shipped, cancelled or refunded, oldest first. */
export async function readOpenOrders(db: Db): Promise<OpenOrderRow[]> {
  const rows = await db('orders as o')
    .join('users as u', 'u.id', 'o.customer_id')
    .join('quotes as q', 'q.id', 'o.quote_id')
    .select(
      'o.id',
      'o.number',
      'u.name as customer_name',
      'o.status',
      'o.total_cents',
      'o.currency',
      'o.needed_by',
      'o.placed_at',
      'q.run_minutes',
    )
    .whereIn('o.status', openOrderStatuses)
    .orderBy([{ column: 'o.placed_at' }, { column: 'o.id' }]);
  return rows.map((row) => ({
    id: row.id,
    number: row.number,
    customerName: row.customer_name,
    status: row.status,
    totalCents: Number(row.total_cents),
    currency: row.currency,
    neededBy: dateOnly(row.needed_by),
    placedAt: row.placed_at ? new Date(row.placed_at) : null,
    runMinutes: Number(row.run_minutes),
  }));
}

/**
 * Captures (from the payments, at captured_at) and refunds (from the order events, which record each refund's
 * amount and time; a payment row only keeps the running total) since `since`.
 */
export async function readMoneyMovements(
  db: Db,
  since: Date,
): Promise<{ captures: MoneyMovement[]; refunds: MoneyMovement[] }> {
  const [captures, refunds] = await Promise.all([
    db('payments')
      .select('captured_at', 'amount_captured_cents')
      .whereNotNull('captured_at')
      .where('captured_at', '>=', since),
    db('order_events')
      .select('created_at', db.raw("JSON_VALUE(payload, '$.amountCents') as amount_cents"))
      .where({ type: 'refunded' })
      .where('created_at', '>=', since),
  ]);
  return {
    captures: captures.map((row) => ({
      at: new Date(row.captured_at),
      amountCents: Number(row.amount_captured_cents),
    })),
    refunds: refunds
      .filter((row) => row.amount_cents !== null)
      .map((row) => ({ at: new Date(row.created_at), amountCents: Number(row.amount_cents) })),
  };
}

/** The settings the weekly figures are worked out from. */
export async function readCapacitySettings(
  db: Db,
): Promise<{ machineHoursPerWeek: number; leadTimeDays: number; currency: string } | undefined> {
  const row = await db('shop_settings')
    .select('machine_hours_per_week', 'lead_time_days', 'currency')
    .where({ id: 1 })
    .first();
  return (
    row && {
      machineHoursPerWeek: Number(row.machine_hours_per_week),
      leadTimeDays: row.lead_time_days,
      currency: row.currency,
    }
  );
}
