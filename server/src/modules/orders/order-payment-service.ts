/**
 * The money moves of the studio: charging the held card once the customer approved the proof, releasing the hold
 * when an order is cancelled, and refunding after the charge. Each runs in one transaction that locks the order and
 * its payment first, so two clicks (or a click and a webhook) are served one after the other and the second finds
 * the work done. Stripe calls carry idempotency keys derived from the order and payment, so a retry after a crash
 * replays Stripe's first answer instead of charging or refunding twice.
 */
import { formatMoneyText } from '../mail/money-text.ts';
import Stripe from 'stripe';
import type { Db } from '../../db/knex.ts';
import type { Mailer } from '../../integrations/mailer.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import type { CancelOrderRequest, OrderActionResponse, RefundOrderRequest } from '../../contracts/studio-orders.ts';
import {
  findStudioOrder,
  lockLivePayment,
  readOrderStanding,
  recordOrderEvent,
  updatePayment,
} from './studio-order-repo.ts';
import { queueLoggedMail, sendQueuedMail, type QueuedMail } from '../mail/order-mail.ts';
import { planOrderMove } from './order-flow.ts';
import { moveOrder } from './order-transitions.ts';
import { applyCapture } from './payment-capture.ts';
import { createOrderCharge } from './order-charge.ts';
import { orderCancelledMail, refundIssuedMail } from './studio-order-mail.ts';

export interface OrderPaymentDeps {
  db: Db;
  stripe: Stripe;
  mailer: Mailer;
  now: () => Date;
  appOrigin: string;
  holdWindowDays: number;
}

/** Who asks: a signed-in member of the studio. */
export interface StudioActor {
  userId: number;
  role: 'staff' | 'owner';
}

/** What a money move answers, and the message it queued in the same transaction, to try once it has committed. */
type Outcome = { result: Result<OrderActionResponse>; mail?: QueuedMail };

const isStripeError = (error: unknown): error is Stripe.errors.StripeError =>
  error instanceof Stripe.errors.StripeError;

/** The payment service answers 404 `resource_missing` for an id it does not know (another account, or lost). */
const isUnknownToProvider = (error: unknown): boolean => isStripeError(error) && error.code === 'resource_missing';

const unknownHold = (paymentIntentId: string, doing: string) =>
  failure(
    'conflict',
    `The payment service has no record of this order's card hold (${paymentIntentId}), so it could not be ${doing}. Nothing was charged; ask the customer to pay again from their order page.`,
  );

export function createOrderPaymentService(deps: OrderPaymentDeps) {
  const { db, stripe } = deps;
  const orderCharge = createOrderCharge(deps);

  async function finish(outcome: Outcome): Promise<Result<OrderActionResponse>> {
    if (outcome.mail) await sendQueuedMail(deps, outcome.mail);
    return outcome.result;
  }

  /**
   * Charges an approved order for its current total and starts production: the hold captured (in part when the
   * total fell), or the kept card charged off-session, or a payment link e-mailed when the bank wants the customer.
   */
  async function capture(number: string, actor: StudioActor): Promise<Result<OrderActionResponse>> {
    const outcome = await db.transaction(async (trx): Promise<Outcome> => {
      const now = deps.now();
      const order = await findStudioOrder(trx, number, { lock: true });
      if (!order) return { result: failure('not-found', `There is no order ${number}.`) };
      const planned = planOrderMove(order.status, 'start_production', actor.role);
      const payment = await lockLivePayment(trx, order.id);
      if (['captured', 'partially_refunded', 'refunded'].includes(order.paymentStatus)) {
        // Charged outside the app before the proof was approved: the order moves on, nothing is charged again.
        if (planned.ok && payment?.status === 'captured' && payment.paymentIntentId) {
          await applyCapture(trx, {
            orderId: order.id,
            paymentId: payment.id,
            paymentIntentId: payment.paymentIntentId,
            capturedCents: payment.capturedCents,
            actor: actor.role,
            actorUserId: actor.userId,
            now,
          });
          return { result: ok(await readOrderStanding(trx, order.id)) };
        }
        return { result: failure('conflict', `Order ${number} has already been charged.`) };
      }
      if (!planned.ok) return { result: failure(planned.kind, planned.reason) };
      return orderCharge.charge(trx, order, payment, actor, now);
    });
    return finish(outcome);
  }

  /** Cancels an order before the charge, releasing a held card. */
  async function cancel(
    number: string,
    request: CancelOrderRequest,
    actor: StudioActor,
  ): Promise<Result<OrderActionResponse>> {
    const outcome = await db.transaction(async (trx): Promise<Outcome> => {
      const now = deps.now();
      const order = await findStudioOrder(trx, number, { lock: true });
      if (!order) return { result: failure('not-found', `There is no order ${number}.`) };
      const planned = planOrderMove(order.status, 'cancel', actor.role);
      if (!planned.ok) return { result: failure(planned.kind, planned.reason) };
      const payment = await lockLivePayment(trx, order.id);
      let wasCardReleased = false;
      if (payment?.status === 'authorized' && payment.paymentIntentId) {
        try {
          await stripe.paymentIntents.cancel(
            payment.paymentIntentId,
            { cancellation_reason: 'requested_by_customer' },
            { idempotencyKey: `cancel-order-${order.id}-${payment.id}` },
          );
        } catch (error) {
          if (isUnknownToProvider(error)) return { result: unknownHold(payment.paymentIntentId, 'released') };
          // A hold that already lapsed has nothing left to release; anything else is not ours to ignore.
          if (
            !isStripeError(error) ||
            error.type !== 'StripeInvalidRequestError' ||
            (await stripe.paymentIntents.retrieve(payment.paymentIntentId)).status !== 'canceled'
          )
            throw error;
        }
        await updatePayment(trx, order.id, payment.id, { status: 'voided' });
        await recordOrderEvent(trx, {
          orderId: order.id,
          type: 'payment_voided',
          actorUserId: actor.userId,
          payload: { paymentIntentId: payment.paymentIntentId },
          now,
        });
        wasCardReleased = true;
      } else if (payment?.status === 'saved') {
        // A card only kept for later holds nothing: it is simply never charged.
        await updatePayment(trx, order.id, payment.id, { status: 'voided' });
      }
      const moved = await moveOrder(trx, {
        orderId: order.id,
        action: 'cancel',
        actor: actor.role,
        actorUserId: actor.userId,
        note: request.reason,
        now,
      });
      if (!moved.ok) throw new Error(`The order moved while it was locked: ${moved.error.message}`);
      return {
        result: ok(await readOrderStanding(trx, order.id)),
        mail: await queueLoggedMail(
          trx,
          orderCancelledMail(order, deps.appOrigin, request.reason, wasCardReleased),
          now,
        ),
      };
    });
    return finish(outcome);
  }

  /** Gives back part or all of what was charged; giving back the rest closes the order as refunded. */
  async function refund(
    number: string,
    request: RefundOrderRequest,
    actor: StudioActor,
  ): Promise<Result<OrderActionResponse>> {
    const outcome = await db.transaction(async (trx): Promise<Outcome> => {
      const now = deps.now();
      const order = await findStudioOrder(trx, number, { lock: true });
      if (!order) return { result: failure('not-found', `There is no order ${number}.`) };
      const planned = planOrderMove(order.status, 'refund', actor.role);
      if (!planned.ok) return { result: failure(planned.kind, planned.reason) };
      const payment = await lockLivePayment(trx, order.id);
      if (!payment?.paymentIntentId || !['captured', 'partially_refunded'].includes(payment.status)) {
        return { result: failure('conflict', 'Nothing is left to refund on this order.') };
      }
      const refundableCents = payment.capturedCents - payment.refundedCents;
      const amountCents = request.amountCents ?? refundableCents;
      if (amountCents > refundableCents) {
        const most = formatMoneyText(refundableCents, order.currency);
        return {
          result: failure('invalid', `At most ${most} can be refunded.`, { amountCents: `Refund at most ${most}` }),
        };
      }
      // Keyed by what had been refunded before, so a retry of this refund replays while a later one is new.
      const stripeRefund = await stripe.refunds.create(
        {
          payment_intent: payment.paymentIntentId,
          amount: amountCents,
          reason: 'requested_by_customer',
          metadata: { orderNumber: order.number },
        },
        { idempotencyKey: `refund-order-${order.id}-${payment.id}-${payment.refundedCents}-${amountCents}` },
      );
      const refundedCents = payment.refundedCents + amountCents;
      const isFull = refundedCents === payment.capturedCents;
      await updatePayment(trx, order.id, payment.id, {
        status: isFull ? 'refunded' : 'partially_refunded',
        refundedCents,
      });
      const payload = { refundId: stripeRefund.id, amountCents };
      if (isFull) {
        const moved = await moveOrder(trx, {
          orderId: order.id,
          action: 'refund',
          actor: actor.role,
          actorUserId: actor.userId,
          note: request.reason,
          payload,
          now,
        });
        if (!moved.ok) throw new Error(`The order moved while it was locked: ${moved.error.message}`);
      } else {
        await recordOrderEvent(trx, {
          orderId: order.id,
          type: 'refunded',
          actorUserId: actor.userId,
          note: request.reason,
          payload,
          now,
        });
      }
      return {
        result: ok(await readOrderStanding(trx, order.id)),
        mail: await queueLoggedMail(
          trx,
          refundIssuedMail(order, deps.appOrigin, { amountCents, isFull, reason: request.reason }),
          now,
        ),
      };
    });
    return finish(outcome);
  }

  return { capture, cancel, refund };
}
export type OrderPaymentService = ReturnType<typeof createOrderPaymentService>;
