import type { Knex } from 'knex';
import type Stripe from 'stripe';
import type { Db } from '../../db/knex.ts';
import type { Mailer } from '../../integrations/mailer.ts';
import { markWebhookEventProcessed, recordWebhookEvent } from './webhook-event-repo.ts';
import { createCheckoutCompleted, readSessionOutcome, type SessionOutcome } from './checkout-completed.ts';
import {
  insertOrderNote,
  lockLatestPendingPayment,
  lockPaymentBy,
  syncOrderPaymentStatus,
  updatePayment,
  type PaymentRecord,
} from './order-repo.ts';
import { applyCapture } from './payment-capture.ts';

/** What a payment webhook changes; `after` runs once the transaction has committed (the e-mails). */
type Effect = { after?: () => Promise<unknown> } | undefined;

/** Said on the order page when the provider gives no reason of its own. */
const GENERIC_DECLINE = 'Your card was not accepted, so nothing was charged.';

/**
 * Applies verified payment events. The event is recorded, applied and marked processed in one transaction, so a
 * redelivery of an event already applied changes nothing, and one that failed half-way is applied afresh the
 * next time the provider sends it. The provider promises no order, so each handler reads the state it changes.
 */
export function createPaymentWebhookService(deps: {
  db: Db;
  stripe: Stripe;
  mailer: Mailer;
  appOrigin: string;
  now: () => Date;
  holdWindowDays: number;
}) {
  const { db } = deps;
  const checkoutCompleted = createCheckoutCompleted(deps, (trx, payment, now) =>
    attemptFailed(trx, payment, GENERIC_DECLINE, now),
  );

  async function receive(event: Stripe.Event, rawPayload: string): Promise<{ isDuplicate: boolean }> {
    // The PaymentIntent's own status is what counts, so it is read before the transaction opens.
    const provider: SessionOutcome =
      event.type === 'checkout.session.completed'
        ? await readSessionOutcome(deps.stripe, event.data.object as Stripe.Checkout.Session)
        : {};
    const outcome = await db.transaction(async (trx) => {
      const now = deps.now();
      const isNew = await recordWebhookEvent(trx, {
        id: event.id,
        type: event.type,
        payload: rawPayload,
        receivedAt: now,
      });
      if (!isNew) return { isDuplicate: true, effect: undefined };
      const effect = await apply(trx, event, provider, now);
      await markWebhookEventProcessed(trx, event.id, now);
      return { isDuplicate: false, effect };
    });
    await outcome.effect?.after?.();
    return { isDuplicate: outcome.isDuplicate };
  }

  async function apply(
    trx: Knex.Transaction,
    event: Stripe.Event,
    outcome: SessionOutcome,
    now: Date,
  ): Promise<Effect> {
    switch (event.type) {
      case 'checkout.session.completed':
        return sessionCompleted(trx, event.data.object, outcome, now);
      case 'checkout.session.expired':
        return attemptFailed(
          trx,
          await lockPaymentBy(trx, { checkoutSessionId: event.data.object.id }),
          'The payment page was left open too long, so nothing was charged.',
          now,
        );
      case 'payment_intent.payment_failed': {
        const pi = event.data.object;
        const payment =
          (await lockPaymentBy(trx, { paymentIntentId: pi.id })) ?? (await pendingPaymentOfOrder(trx, pi.metadata));
        return attemptFailed(trx, payment, pi.last_payment_error?.message ?? GENERIC_DECLINE, now);
      }
      case 'setup_intent.setup_failed': {
        // A card declined on a page that only keeps it (setup mode): the attempt failed as a declined payment does.
        const si = event.data.object;
        const payment = await pendingPaymentOfOrder(trx, si.metadata);
        return attemptFailed(trx, payment, si.last_setup_error?.message ?? GENERIC_DECLINE, now);
      }
      case 'payment_intent.canceled':
        return bringInLine(
          trx,
          event.data.object.id,
          (p) => (p.status === 'authorized' ? { status: 'voided' } : undefined),
          now,
        );
      case 'payment_intent.succeeded': {
        // Captured, by the studio's own charge (already recorded) or outside the app: the same rule either way.
        const pi = event.data.object;
        const payment = await lockPaymentBy(trx, { paymentIntentId: pi.id });
        if (payment?.status !== 'authorized') return undefined;
        await applyCapture(trx, {
          orderId: payment.orderId,
          paymentId: payment.id,
          paymentIntentId: pi.id,
          capturedCents: Math.min(pi.amount_received, payment.authorizedCents),
          actor: 'system',
          actorUserId: null,
          now,
        });
        return undefined;
      }
      case 'charge.refunded': {
        const charge = event.data.object;
        const intentId = typeof charge.payment_intent === 'string' ? charge.payment_intent : charge.payment_intent?.id;
        if (!intentId) return undefined;
        // A refund applies only to money that was captured, and only up to it; a refund reported for a hold that
        // was never captured is recorded with the event and changes nothing.
        return bringInLine(
          trx,
          intentId,
          (p) => {
            if (!['captured', 'partially_refunded'].includes(p.status) || p.capturedCents <= 0) return undefined;
            const refundedCents = Math.min(charge.amount_refunded, p.capturedCents);
            if (refundedCents <= p.refundedCents) return undefined;
            return {
              amount_refunded_cents: refundedCents,
              status: refundedCents === p.capturedCents ? 'refunded' : 'partially_refunded',
            };
          },
          now,
        );
      }
      default:
        return undefined;
    }
  }

  /** The payment page finished: a held card, a card kept for later, or a payment link paid. */
  async function sessionCompleted(
    trx: Knex.Transaction,
    session: Stripe.Checkout.Session,
    outcome: SessionOutcome,
    now: Date,
  ): Promise<Effect> {
    const payment =
      (await lockPaymentBy(trx, { checkoutSessionId: session.id })) ??
      (await pendingPaymentOfOrder(trx, session.metadata));
    // A declined card fails the attempt, yet the customer may try another card on the same page and succeed.
    if (!payment || !['pending', 'failed'].includes(payment.status)) return undefined;
    return checkoutCompleted.completed(trx, session, payment, outcome, now);
  }

  /** A declined card or an abandoned page: the attempt failed, the order keeps waiting for payment. */
  async function attemptFailed(
    trx: Knex.Transaction,
    payment: PaymentRecord | undefined,
    message: string,
    now: Date,
  ): Promise<Effect> {
    if (!payment || payment.status !== 'pending') return undefined;
    await updatePayment(trx, payment.id, { status: 'failed' }, now);
    await insertOrderNote(trx, {
      orderId: payment.orderId,
      type: 'payment_failed',
      actorUserId: null,
      note: message,
      at: now,
    });
    return undefined;
  }

  /** Brings a payment row in line with the provider; the studio's own calls usually got there first. */
  async function bringInLine(
    trx: Knex.Transaction,
    paymentIntentId: string,
    change: (payment: PaymentRecord) => Record<string, unknown> | undefined,
    now: Date,
  ): Promise<Effect> {
    const payment = await lockPaymentBy(trx, { paymentIntentId });
    const changes = payment && change(payment);
    if (!payment || !changes) return undefined;
    await updatePayment(trx, payment.id, changes, now);
    await syncOrderPaymentStatus(trx, payment.orderId, now);
    return undefined;
  }

  return { receive };
}

/** The pending attempt of the order named in the metadata, when the provider's ids are not on the row yet. */
async function pendingPaymentOfOrder(
  trx: Knex.Transaction,
  metadata: Stripe.Metadata | null | undefined,
): Promise<PaymentRecord | undefined> {
  const orderId = Number(metadata?.orderId);
  return Number.isInteger(orderId) && orderId > 0 ? lockLatestPendingPayment(trx, orderId) : undefined;
}

export type PaymentWebhookService = ReturnType<typeof createPaymentWebhookService>;
