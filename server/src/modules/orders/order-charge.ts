/**
 * The studio's charge of an approved order, always for the order's current total at that moment. A live hold that
 * covers it is captured (with `amount_to_capture` when the total fell); a total above the hold, a hold that lapsed,
 * or a card only kept for later is charged off-session on the kept card; and when the bank wants the customer (or
 * no card is kept) the customer is e-mailed a payment link, also shown on their order page. Runs inside the
 * caller's transaction with the order row locked, so one click charges once.
 */
import type { Knex } from 'knex';
import Stripe from 'stripe';
import { chargeStepOf } from '../../engine/index.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import type { OrderActionResponse } from '../../contracts/studio-orders.ts';
import { formatMoneyText } from '../mail/money-text.ts';
import { queueLoggedMail, type QueuedMail } from '../mail/order-mail.ts';
import { insertPendingPayment, readOrderDescription, updatePayment as writePayment } from './order-repo.ts';
import {
  readOrderStanding,
  recordOrderEvent,
  updatePayment,
  type OrderPayment,
  type StudioOrder,
} from './studio-order-repo.ts';
import { applyCapture } from './payment-capture.ts';
import { openCheckoutSession } from './checkout-session.ts';
import { findKeptCard, forgetKeptCard } from './kept-card-repo.ts';
import { cardChargedMail, confirmPaymentMail } from './payment-mail.ts';
import { payAgainMail } from './studio-order-mail.ts';

export interface OrderChargeDeps {
  stripe: Stripe;
  appOrigin: string;
}

export interface ChargeActor {
  userId: number;
  role: 'staff' | 'owner';
}

export type ChargeOutcome = { result: Result<OrderActionResponse>; mail?: QueuedMail };

type KeptCard = { paymentId: number; customerId: string; paymentMethodId: string };

const isStripeError = (error: unknown): error is Stripe.errors.StripeError =>
  error instanceof Stripe.errors.StripeError;

const unknownHold = (intentId: string): ChargeOutcome => ({
  result: failure(
    'conflict',
    `The payment service has no record of this order's card hold (${intentId}), so it could not be charged. Nothing was charged; ask the customer to pay again from their order page.`,
  ),
});

export function createOrderCharge(deps: OrderChargeDeps) {
  const { stripe } = deps;

  /** Charges `payment` (a hold or a kept card, locked with the order) for the order's current total. */
  async function charge(
    trx: Knex.Transaction,
    order: StudioOrder,
    payment: OrderPayment | undefined,
    actor: ChargeActor,
    now: Date,
  ): Promise<ChargeOutcome> {
    const hold = payment?.status === 'authorized' && payment.paymentIntentId ? payment : undefined;
    const kept: KeptCard | undefined = payment?.keptCard
      ? { paymentId: payment.id, ...payment.keptCard }
      : await findKeptCard(trx, order.id);
    if (!hold && !kept) {
      return {
        result: failure(
          'conflict',
          'No card is held for this order, so there is nothing to charge. The customer needs to pay again first.',
        ),
      };
    }
    const step = chargeStepOf({
      totalCents: order.totalCents,
      hold: hold ? { heldCents: hold.authorizedCents, captureBeforeMs: hold.captureBefore?.getTime() ?? null } : null,
      hasSavedCard: kept !== undefined,
      nowMs: now.getTime(),
    });
    if (hold && (step.kind === 'capture' || step.kind === 'capture_less')) {
      const captured = await captureHold(
        trx,
        order,
        hold,
        step.kind === 'capture_less' ? step.amountCents : null,
        actor,
        now,
      );
      if (captured !== 'lapsed') return captured;
      if (!kept) return markLapsed(trx, order, hold.id, actor, now);
    } else if (hold) {
      if (!kept && step.kind === 'ask_customer' && step.why === 'hold_lapsed')
        return markLapsed(trx, order, hold.id, actor, now);
      const unknown = await letHoldGo(trx, order, hold, actor, now);
      if (unknown) return unknown;
      if (!kept) return askCustomer(trx, order, null, 'no_card', actor, now);
    }
    return chargeKeptCard(trx, order, kept!, actor, now);
  }

  /** Captures the hold, all of it or `amountCents`; 'lapsed' when the provider had already let it go. */
  async function captureHold(
    trx: Knex.Transaction,
    order: StudioOrder,
    hold: OrderPayment,
    amountCents: number | null,
    actor: ChargeActor,
    now: Date,
  ): Promise<ChargeOutcome | 'lapsed'> {
    const intentId = hold.paymentIntentId!;
    let capturedCents: number;
    try {
      const intent = await stripe.paymentIntents.capture(
        intentId,
        amountCents === null ? {} : { amount_to_capture: amountCents },
        { idempotencyKey: `capture-order-${order.id}-${hold.id}` },
      );
      capturedCents = intent.amount_received;
    } catch (error) {
      if (isStripeError(error) && error.code === 'resource_missing') return unknownHold(intentId);
      if (!isStripeError(error) || error.type !== 'StripeInvalidRequestError') throw error;
      const intent = await stripe.paymentIntents.retrieve(intentId);
      if (intent.status === 'canceled') {
        await updatePayment(trx, order.id, hold.id, { status: 'voided' });
        return 'lapsed';
      }
      if (intent.status !== 'succeeded')
        return { result: failure('payment-failed', `The card could not be charged: ${error.message}`) };
      // Charged by an earlier attempt whose answer was lost: record that charge, never make a second one.
      capturedCents = intent.amount_received;
    }
    return recordCharge(
      trx,
      order,
      { paymentId: hold.id, intentId, capturedCents, heldCents: hold.authorizedCents },
      actor,
      now,
    );
  }

  async function recordCharge(
    trx: Knex.Transaction,
    order: StudioOrder,
    done: { paymentId: number; intentId: string; capturedCents: number; heldCents: number | null },
    actor: ChargeActor,
    now: Date,
  ): Promise<ChargeOutcome> {
    await applyCapture(trx, {
      orderId: order.id,
      paymentId: done.paymentId,
      paymentIntentId: done.intentId,
      capturedCents: done.capturedCents,
      actor: actor.role,
      actorUserId: actor.userId,
      now,
    });
    const mail = cardChargedMail(order, deps.appOrigin, { amountCents: done.capturedCents, heldCents: done.heldCents });
    return { result: ok(await readOrderStanding(trx, order.id)), mail: await queueLoggedMail(trx, mail, now) };
  }

  /** Releases a hold that cannot pay the total (too small) or that lapsed; the kept card is charged instead. */
  async function letHoldGo(
    trx: Knex.Transaction,
    order: StudioOrder,
    hold: OrderPayment,
    actor: ChargeActor,
    now: Date,
  ): Promise<ChargeOutcome | undefined> {
    const isLive = hold.captureBefore === null || hold.captureBefore > now;
    if (isLive) {
      try {
        await stripe.paymentIntents.cancel(
          hold.paymentIntentId!,
          { cancellation_reason: 'requested_by_customer' },
          { idempotencyKey: `release-order-${order.id}-${hold.id}` },
        );
      } catch (error) {
        if (isStripeError(error) && error.code === 'resource_missing') return unknownHold(hold.paymentIntentId!);
        const intent = await stripe.paymentIntents.retrieve(hold.paymentIntentId!).catch(() => undefined);
        if (intent?.status !== 'canceled') throw error;
      }
    }
    await updatePayment(trx, order.id, hold.id, { status: 'voided' });
    await recordOrderEvent(trx, {
      orderId: order.id,
      type: isLive ? 'payment_voided' : 'authorization_lapsed',
      actorUserId: actor.userId,
      payload: { paymentId: hold.id, heldCents: hold.authorizedCents, totalCents: order.totalCents },
      now,
    });
    return undefined;
  }

  /** Charges the kept card without the customer present (`off_session`), for the order's current total. */
  async function chargeKeptCard(
    trx: Knex.Transaction,
    order: StudioOrder,
    kept: KeptCard,
    actor: ChargeActor,
    now: Date,
  ): Promise<ChargeOutcome> {
    try {
      const intent = await stripe.paymentIntents.create(
        {
          amount: order.totalCents,
          currency: order.currency.toLowerCase(),
          customer: kept.customerId,
          payment_method: kept.paymentMethodId,
          off_session: true,
          confirm: true,
          description: `Order ${order.number}`,
          // No orderId: a failure event must not be taken for the order's pending checkout attempt.
          metadata: { orderNumber: order.number, keptCardOf: String(kept.paymentId) },
        },
        { idempotencyKey: `charge-order-${order.id}-${kept.paymentId}-${order.totalCents}` },
      );
      if (intent.status !== 'succeeded') return askCustomer(trx, order, kept, 'bank', actor, now);
      const paymentId = await insertPendingPayment(trx, order, now, {
        method: 'off_session',
        amount_authorized_cents: intent.amount_received,
        provider_customer_id: kept.customerId,
      });
      await writePayment(
        trx,
        paymentId,
        { payment_intent_id: intent.id, payment_method_id: kept.paymentMethodId, authorized_at: now },
        now,
      );
      return recordCharge(
        trx,
        order,
        { paymentId, intentId: intent.id, capturedCents: intent.amount_received, heldCents: null },
        actor,
        now,
      );
    } catch (error) {
      if (!isStripeError(error) || error.type !== 'StripeCardError') throw error;
      return askCustomer(trx, order, kept, error.code === 'authentication_required' ? 'bank' : 'declined', actor, now);
    }
  }

  /**
   * The customer has to pay themselves: a payment page for the current total, e-mailed to them and kept on the
   * payment row so their order page shows it. A card the bank will not let us charge alone is no longer kept.
   */
  async function askCustomer(
    trx: Knex.Transaction,
    order: StudioOrder,
    kept: KeptCard | null,
    why: 'bank' | 'declined' | 'no_card',
    actor: ChargeActor,
    now: Date,
  ): Promise<ChargeOutcome> {
    if (kept) await forgetKeptCard(trx, order.id, kept.paymentMethodId);
    const paymentId = await insertPendingPayment(trx, order, now, {
      method: 'payment_link',
      ...(kept ? { provider_customer_id: kept.customerId } : {}),
    });
    const description = (await readOrderDescription(trx, order.id)) ?? order.number;
    const providerCustomerId =
      kept?.customerId ??
      (await stripe.customers.create({ email: order.customerEmail, metadata: { orderNumber: order.number } })).id;
    const session = await openCheckoutSession(
      stripe,
      deps.appOrigin,
      { ...order, description },
      { id: paymentId, method: 'payment_link', providerCustomerId },
    );
    await writePayment(
      trx,
      paymentId,
      { checkout_session_id: session.id, payment_page_url: session.url, provider_customer_id: providerCustomerId },
      now,
    );
    await recordOrderEvent(trx, {
      orderId: order.id,
      type: 'payment_needs_customer',
      actorUserId: actor.userId,
      payload: { paymentId, amountCents: order.totalCents, why },
      now,
    });
    const amount = formatMoneyText(order.totalCents, order.currency);
    const said = {
      bank: 'The customer’s bank wants them to confirm this payment themselves, so nothing was charged.',
      declined: 'The kept card was declined, so nothing was charged.',
      no_card:
        'The hold on the card does not cover the new total and no card is kept for later, so nothing was charged.',
    }[why];
    const mail = confirmPaymentMail(order, { amountCents: order.totalCents, pageUrl: session.url, why });
    return {
      result: failure(
        'conflict',
        `${said} We have e-mailed them a link to pay ${amount}; the order goes into production as soon as they have.`,
      ),
      mail: await queueLoggedMail(trx, mail, now),
    };
  }

  /** The hold ran out and no card is kept: the payment is voided and the customer asked to pay again. */
  async function markLapsed(
    trx: Knex.Transaction,
    order: StudioOrder,
    paymentId: number,
    actor: ChargeActor,
    now: Date,
  ): Promise<ChargeOutcome> {
    await updatePayment(trx, order.id, paymentId, { status: 'voided' });
    await recordOrderEvent(trx, {
      orderId: order.id,
      type: 'authorization_lapsed',
      actorUserId: actor.userId,
      payload: { paymentId },
      now,
    });
    return {
      result: failure(
        'conflict',
        'The hold on the customer’s card has run out, so nothing could be charged. We have e-mailed them a link to confirm their card again; charge the order once they have.',
      ),
      mail: await queueLoggedMail(trx, payAgainMail(order, deps.appOrigin), now),
    };
  }

  return { charge };
}
