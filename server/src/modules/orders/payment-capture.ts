/**
 * One rule for money taken from a held card, whoever took it: the studio's charge button, or a capture made outside
 * the app (the provider's dashboard) that arrives as a webhook. The payment records what was captured, and an order
 * whose proof is approved goes into production with the event the studio's own charge writes. An order that is not
 * that far yet keeps its status with the capture noted; once its proof is approved, the studio's charge button
 * moves it on through this same rule without charging again.
 */
import type { Knex } from 'knex';
import { insertOrderNote, syncOrderPaymentStatus, updatePayment } from './order-repo.ts';
import { lockOrderForMove } from './order-move-repo.ts';
import { planOrderMove, type OrderActor } from './order-flow.ts';
import { moveOrder } from './order-transitions.ts';

export interface CapturedMoney {
  orderId: number;
  paymentId: number;
  paymentIntentId: string;
  capturedCents: number;
  actor: OrderActor;
  actorUserId: number | null;
  now: Date;
}

/** Records the capture on the payment and moves the order into production when its proof is approved. */
export async function applyCapture(
  trx: Knex.Transaction,
  capture: CapturedMoney,
): Promise<{ isInProduction: boolean }> {
  const { orderId, paymentId, paymentIntentId, capturedCents, actor, actorUserId, now } = capture;
  await updatePayment(
    trx,
    paymentId,
    { status: 'captured', amount_captured_cents: capturedCents, captured_at: now },
    now,
  );
  await syncOrderPaymentStatus(trx, orderId, now);
  const order = await lockOrderForMove(trx, orderId);
  if (!order) throw new Error(`Payment ${paymentId} belongs to no order.`);
  const payload = { paymentIntentId, amountCents: capturedCents };
  if (!planOrderMove(order.status, 'start_production', actor).ok) {
    await insertOrderNote(trx, { orderId, type: 'payment_captured', actorUserId, payload, at: now });
    return { isInProduction: false };
  }
  const moved = await moveOrder(trx, { orderId, action: 'start_production', actor, actorUserId, payload, now });
  if (!moved.ok) throw new Error(`The order moved while it was locked: ${moved.error.message}`);
  return { isInProduction: true };
}
