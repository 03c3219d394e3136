import type { Knex } from 'knex';
import type { OrderStatus } from '../../contracts/order-status.ts';

/** The order row a move starts from, locked until the transaction ends. */
export async function lockOrderForMove(
  trx: Knex.Transaction,
  orderId: number,
): Promise<{ id: number; status: OrderStatus; placedAt: Date | null } | undefined> {
  const row = await trx('orders').where({ id: orderId }).forUpdate().first('id', 'status', 'placed_at');
  return row && { id: row.id, status: row.status as OrderStatus, placedAt: row.placed_at ?? null };
}

export interface OrderMoveRecord {
  orderId: number;
  from: OrderStatus;
  to: OrderStatus;
  event: string;
  /** Set when the move puts the order in the studio's queue for the first time. */
  placedAt?: Date;
  actorUserId: number | null;
  note: string | null;
  payload: object | null;
  at: Date;
}

/** Writes the order's new status and the event that tells who moved it and when; returns the event's id. */
export async function writeOrderMove(trx: Knex.Transaction, move: OrderMoveRecord): Promise<number> {
  await trx('orders')
    .where({ id: move.orderId })
    .update({ status: move.to, ...(move.placedAt ? { placed_at: move.placedAt } : {}) });
  const [eventId] = await trx('order_events').insert({
    order_id: move.orderId,
    actor_user_id: move.actorUserId,
    type: move.event,
    from_status: move.from,
    to_status: move.to,
    note: move.note,
    payload: move.payload ? JSON.stringify(move.payload) : null,
    created_at: move.at,
  });
  return eventId!;
}
