import type { Knex } from 'knex';
import { lockOrderForMove, writeOrderMove } from './order-move-repo.ts';
import type { OrderStatus } from '../../contracts/order-status.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import { planOrderMove, type OrderAction, type OrderActor } from './order-flow.ts';

export interface OrderMoveRequest {
  orderId: number;
  action: OrderAction;
  actor: OrderActor;
  /** NULL when the system acted (a payment webhook, an expiry). */
  actorUserId: number | null;
  note?: string | null;
  payload?: object | null;
  now: Date;
}

export interface OrderMoved {
  orderId: number;
  from: OrderStatus;
  to: OrderStatus;
  eventId: number;
}

/**
 * Moves one order by the state machine inside the caller's transaction: the order row is locked first, so two
 * clicks (or a click and a webhook) cannot both move it; the loser gets the refusal for the status it then finds.
 * Writes the order event with who and when. Payment calls belong to the caller, after the move is planned and
 * before the transaction commits.
 */
export async function moveOrder(trx: Knex.Transaction, request: OrderMoveRequest): Promise<Result<OrderMoved>> {
  const order = await lockOrderForMove(trx, request.orderId);
  if (!order) return failure('not-found', 'There is no such order.');
  const from = order.status;
  const planned = planOrderMove(from, request.action, request.actor);
  if (!planned.ok) return failure(planned.kind, planned.reason);

  const eventId = await writeOrderMove(trx, {
    orderId: order.id,
    from,
    to: planned.to,
    event: planned.event,
    // An order joins the studio's queue when the card is held (orders_placed_at CHECK).
    ...(planned.to === 'authorized' && !order.placedAt ? { placedAt: request.now } : {}),
    actorUserId: request.actorUserId,
    note: request.note ?? null,
    payload: request.payload ?? null,
    at: request.now,
  });
  return ok({ orderId: order.id, from, to: planned.to, eventId });
}
