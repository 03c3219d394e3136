/**
 * A hosted payment page finished (`checkout.session.completed`). What it did is read from the provider's own
 * objects, not the event: a PaymentIntent holding the card (`requires_capture`), a SetupIntent keeping it for
 * later (setup mode), or a PaymentIntent already paid (a payment link for an approved order). Each moves the order
 * as its flow says, inside the webhook's transaction.
 */
import type { Knex } from 'knex';
import type Stripe from 'stripe';
import type { Db } from '../../db/knex.ts';
import type { Mailer } from '../../integrations/mailer.ts';
import { dueDateOf } from '../../engine/index.ts';
import { shopCalendarOf, shopScheduleOf } from '../settings/settings-service.ts';
import {
  findCustomerEmail,
  findOrderById,
  findOrderNeededBy,
  insertOrderNote,
  syncOrderPaymentStatus,
  updatePayment,
  type PaymentRecord,
} from './order-repo.ts';
import { findStudioOrder } from './studio-order-repo.ts';
import { queueLoggedMail, sendQueuedMail, type LoggedMail } from '../mail/order-mail.ts';
import { formatMoneyText } from '../mail/money-text.ts';
import { moveOrder } from './order-transitions.ts';
import { applyCapture } from './payment-capture.ts';
import { finalStatuses } from './order-flow.ts';
import { orderPlacedMail } from './customer-order-mail.ts';
import { cardChargedMail } from './payment-mail.ts';

/** What the provider says the page did. */
export type SessionOutcome = { intent?: Stripe.PaymentIntent; setupIntent?: Stripe.SetupIntent };

export interface CheckoutCompletedDeps {
  db: Db;
  stripe: Stripe;
  mailer: Mailer;
  appOrigin: string;
  now: () => Date;
}

type Effect = { after?: () => Promise<unknown> } | undefined;

const idOf = (value: string | { id: string } | null | undefined) => (typeof value === 'string' ? value : value?.id);

/** Read before the webhook's transaction opens: the intent the session made. */
export async function readSessionOutcome(stripe: Stripe, session: Stripe.Checkout.Session): Promise<SessionOutcome> {
  const setupId = idOf(session.setup_intent);
  if (setupId) return { setupIntent: await stripe.setupIntents.retrieve(setupId) };
  const intentId = idOf(session.payment_intent);
  return intentId ? { intent: await stripe.paymentIntents.retrieve(intentId, { expand: ['latest_charge'] }) } : {};
}

export function createCheckoutCompleted(
  deps: CheckoutCompletedDeps,
  attemptFailed: (trx: Knex.Transaction, payment: PaymentRecord, now: Date) => Promise<Effect>,
) {
  const afterCommit = (queued: Awaited<ReturnType<typeof queueLoggedMail>>) => ({
    after: () => sendQueuedMail({ db: deps.db, mailer: deps.mailer, now: deps.now }, queued),
  });

  /** The customer paid an approved order on a payment link: the charge is recorded and production starts. */
  async function paidOnLink(trx: Knex.Transaction, payment: PaymentRecord, intent: Stripe.PaymentIntent, now: Date) {
    await updatePayment(
      trx,
      payment.id,
      {
        payment_intent_id: intent.id,
        payment_method_id: idOf(intent.payment_method) ?? null,
        amount_authorized_cents: intent.amount_received,
        authorized_at: now,
      },
      now,
    );
    await applyCapture(trx, {
      orderId: payment.orderId,
      paymentId: payment.id,
      paymentIntentId: intent.id,
      capturedCents: intent.amount_received,
      actor: 'system',
      actorUserId: null,
      now,
    });
    const order = await findOrderById(trx, payment.orderId);
    const studioOrder = order && (await findStudioOrder(trx, order.number));
    if (!studioOrder) throw new Error(`Payment ${payment.id} belongs to no order.`);
    const mail = cardChargedMail(studioOrder, deps.appOrigin, { amountCents: intent.amount_received, heldCents: null });
    return afterCommit(await queueLoggedMail(trx, mail, now));
  }

  /** The card is held, or kept for later: the payment records which, and a waiting order is placed. */
  async function completed(
    trx: Knex.Transaction,
    session: Stripe.Checkout.Session,
    payment: PaymentRecord,
    outcome: SessionOutcome,
    now: Date,
  ): Promise<Effect> {
    const { intent, setupIntent } = outcome;
    if (intent?.status === 'succeeded' && payment.method === 'payment_link')
      return paidOnLink(trx, payment, intent, now);
    let heldCents: number;
    if (setupIntent?.status === 'succeeded' && idOf(setupIntent.payment_method)) {
      heldCents = 0;
      await updatePayment(
        trx,
        payment.id,
        {
          status: 'saved',
          method: 'saved_card',
          checkout_session_id: session.id,
          provider_customer_id: idOf(setupIntent.customer) ?? null,
          payment_method_id: idOf(setupIntent.payment_method),
          authorized_at: now,
        },
        now,
      );
    } else if (intent?.status === 'requires_capture') {
      heldCents = intent.amount_capturable;
      const charge = typeof intent.latest_charge === 'object' ? intent.latest_charge : null;
      const captureBefore = charge?.payment_method_details?.card?.capture_before;
      // A card kept with the hold (setup_future_usage) can be charged later if the hold lapses or the total grows.
      const isKept = intent.setup_future_usage === 'off_session' && idOf(intent.customer);
      await updatePayment(
        trx,
        payment.id,
        {
          status: 'authorized',
          checkout_session_id: session.id,
          payment_intent_id: intent.id,
          amount_authorized_cents: intent.amount_capturable,
          capture_before: captureBefore ? new Date(captureBefore * 1000) : null,
          provider_customer_id: isKept ? idOf(intent.customer) : null,
          payment_method_id: isKept ? (idOf(intent.payment_method) ?? null) : null,
          authorized_at: now,
        },
        now,
      );
    } else {
      return attemptFailed(trx, payment, now);
    }
    const order = await findOrderById(trx, payment.orderId);
    if (!order) throw new Error(`Payment ${payment.id} belongs to no order.`);
    const payload = {
      paymentIntentId: intent?.id ?? null,
      setupIntentId: setupIntent?.id ?? null,
      amountCents: heldCents,
    };
    if (order.status === 'awaiting_payment') {
      const moved = await moveOrder(trx, {
        orderId: order.id,
        action: 'authorize',
        actor: 'system',
        actorUserId: null,
        payload,
        now,
      });
      if (!moved.ok) throw new Error(`Order ${order.number} could not take its payment: ${moved.error.message}`);
    } else {
      // A second payment after a lapsed hold: the order is already under way, so only the new card is noted.
      const type = setupIntent ? 'card_saved' : 'payment_authorized';
      await insertOrderNote(trx, { orderId: order.id, type, actorUserId: null, payload, at: now });
    }
    if (finalStatuses.includes(order.status)) {
      // The order was cancelled while the payment page was open: the new hold is let go at once.
      if (intent) await deps.stripe.paymentIntents.cancel(intent.id, { cancellation_reason: 'abandoned' });
      await updatePayment(trx, payment.id, { status: 'voided' }, now);
      await insertOrderNote(trx, {
        orderId: order.id,
        type: 'payment_voided',
        actorUserId: null,
        payload: { paymentIntentId: intent?.id ?? null },
        at: now,
      });
    }
    await syncOrderPaymentStatus(trx, order.id, now);
    if (order.status !== 'awaiting_payment') return undefined;
    const customerEmail = await findCustomerEmail(trx, order.id);
    const [shop, calendar, neededBy] = await Promise.all([
      shopScheduleOf(trx),
      shopCalendarOf(trx),
      findOrderNeededBy(trx, order.id),
    ]);
    // The card is held now, so this is the moment the lead time counts from (the order's placed_at).
    const dueDate = dueDateOf({ neededBy, placedAtMs: now.getTime() }, calendar);
    const mail: LoggedMail = orderPlacedMail(
      { appOrigin: deps.appOrigin, shopName: shop.name, number: order.number, orderId: order.id },
      customerEmail,
      formatMoneyText(setupIntent ? order.totalCents : heldCents, order.currency),
      dueDate === null ? null : { date: dueDate, isAskedFor: neededBy !== null },
      setupIntent ? 'saved' : 'held',
    );
    // Queued with the order's move, in this transaction; the first attempt follows the commit.
    return afterCommit(await queueLoggedMail(trx, mail, now));
  }

  return { completed };
}
