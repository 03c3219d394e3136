import { withPickupNote } from './order-delivery.ts';
import type { Db } from '../../db/knex.ts';
import type { Mailer } from '../../integrations/mailer.ts';
import {
  listCustomerOrders,
  lockLatestProof,
  ordersWithProofWaiting,
  readCustomerOrder,
  readProofImage,
  recordProofAnswer,
} from './customer-order-repo.ts';
import { findCustomerOrder, listPayments, type PaymentRecord } from './order-repo.ts';
import { shopCalendarOf, shopScheduleOf } from '../settings/settings-service.ts';
import { restoreDesign } from '../../contracts/designs.ts';
import type {
  CustomerOrderAction,
  CustomerOrderResponse,
  customerOrderListResponse,
  proofAnswerRequest,
} from '../../contracts/orders.ts';
import type { CurrentUser } from '../../contracts/users.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import type { z } from 'zod';
import { availableOrderActions } from './order-flow.ts';
import { moveOrder } from './order-transitions.ts';
import { queueLoggedMail, sendQueuedMail, type QueuedMail } from '../mail/order-mail.ts';
import { proofAnsweredStudioMail, proofApprovedMail } from './customer-order-mail.ts';
import { customerTimeline } from './customer-order-wording.ts';
import { isPaymentNeeded } from './checkout-service.ts';
import type { QuoteService } from '../quotes/quote-service.ts';
import { dueDateOf } from '../../engine/index.ts';
import { adoptApprovedProofPrice } from './order-price-of-record.ts';
import { latestProofDocument } from './proof-repo.ts';
import { designUploadPictures, uploadsOf } from '../artwork/artwork-service.ts';

type ProofAnswer = z.output<typeof proofAnswerRequest>;

/** The customer's orders and proofs: each person reaches only their own, and anyone else's reads as missing. */
export function createCustomerOrderService(deps: {
  db: Db;
  mailer: Mailer;
  quotes: Pick<QuoteService, 'guidanceFor'>;
  appOrigin: string;
  now: () => Date;
}) {
  const { db } = deps;

  /** The due date of each order by the one rule, in the shop's calendar. */
  async function dueDates() {
    const schedule = await shopCalendarOf(db);
    return (order: { neededBy: string | null; placedAt: string | null }) =>
      dueDateOf(
        { neededBy: order.neededBy, placedAtMs: order.placedAt === null ? null : Date.parse(order.placedAt) },
        schedule,
      );
  }

  async function list(customerId: number): Promise<Result<z.infer<typeof customerOrderListResponse>>> {
    const [orders, dueDateOfOrder] = await Promise.all([listCustomerOrders(db, customerId), dueDates()]);
    const proofWaiting = await ordersWithProofWaiting(
      db,
      orders.map((o) => o.id),
    );
    return ok({
      orders: orders.map((o) => ({
        number: o.number,
        status: o.status,
        paymentStatus: o.paymentStatus,
        description: o.description,
        designName: o.designName,
        garmentName: o.garmentName,
        totalCents: o.totalCents,
        currency: o.currency,
        neededBy: o.neededBy,
        dueDate: dueDateOfOrder(o),
        createdAt: o.createdAt,
        placedAt: o.placedAt,
        isWaitingOnCustomer: o.status === 'awaiting_payment' || (o.status === 'proof_sent' && proofWaiting.has(o.id)),
      })),
    });
  }

  async function get(customerId: number, number: string): Promise<Result<CustomerOrderResponse>> {
    const detail = await readCustomerOrder(db, customerId, number);
    if (!detail) return noSuchOrder(number);
    const [payments, proofDocument] = await Promise.all([
      listPayments(db, detail.order.id),
      latestProofDocument(db, detail.order.id),
    ]);
    // The design as the latest proof showed it: the studio may have changed it at the customer's request.
    const restored = restoreDesign(proofDocument ?? detail.design.document);
    if (!restored.success) throw new Error(`The design of ${number} no longer restores: ${restored.error.message}`);
    const { order } = detail;
    const now = deps.now();
    const latestSent = detail.proofs.findLast((p) => p.status === 'sent');
    const latestVersion = detail.proofs.at(-1)?.version;
    const needsPayment = isPaymentNeeded(order, payments, now);
    const { garmentId, sizeId } = detail.design;
    const { cautions, layoutNotes } = await deps.quotes.guidanceFor(
      { garmentId, sizeId, document: restored.data },
      { userId: customerId },
    );
    const flowActions = availableOrderActions(order.status, 'customer').filter(
      (action) => action === 'cancel' || latestSent !== undefined,
    );
    const actions: CustomerOrderAction[] = [
      ...(needsPayment ? (['pay'] as const) : []),
      ...(flowActions as CustomerOrderAction[]),
    ];
    return ok({
      order: {
        ...withoutId(order),
        delivery: await withPickupNote(db, order.delivery),
        dueDate: (await dueDates())(order),
        isRush: detail.quote.isRush,
        isWaitingOnCustomer: needsPayment || latestSent !== undefined,
      },
      // Once a proof with its own price is approved, its lines are the order's.
      quote: {
        ruleSetVersion: detail.quote.ruleSetVersion,
        lines: detail.proofs.findLast((p) => p.status === 'approved' && p.price)?.price?.lines ?? detail.quote.lines,
      },
      design: {
        ...detail.design,
        document: restored.data,
        uploads: uploadsOf(restored.data, await designUploadPictures(db, customerId, [restored.data])),
      },
      cautions,
      layoutNotes,
      payment: paymentSummary(payments, detail.events, needsPayment, now),
      proofs: detail.proofs.map(({ hasImage, ...proof }) => ({
        ...proof,
        imageUrl: hasImage ? `/api/orders/${encodeURIComponent(number)}/proofs/${proof.version}/image` : null,
        isAnswerable: proof.status === 'sent' && proof.version === latestVersion,
      })),
      timeline: customerTimeline(detail.events, order.currency),
      actions,
    });
  }

  /** The proof picture for its customer, or for the studio. */
  async function proofImage(viewer: CurrentUser, number: string, version: number): Promise<Result<Buffer>> {
    const image = await readProofImage(db, number, version, viewer.role === 'customer' ? viewer.id : null);
    return image ? ok(image) : failure('not-found', `There is no picture for proof ${version} of ${number}.`);
  }

  /**
   * The customer's answer to the latest proof: approval lets the studio charge the card and start; a change
   * request sends the studio back to the design. Only the latest version, while unanswered, can be answered.
   */
  async function answerProof(
    customer: CurrentUser,
    number: string,
    version: number,
    isApproved: boolean,
    answer: ProofAnswer,
  ): Promise<Result<{ number: string; version: number }>> {
    if (!isApproved && !answer.comment && answer.pins.length === 0) {
      return failure('invalid', 'Say what you would like changed, in a comment or with a pin on the picture.', {
        comment: 'Say what you would like changed',
      });
    }
    const order = await findCustomerOrder(db, customer.id, number);
    if (!order) return noSuchOrder(number);
    const now = deps.now();
    const done = await db.transaction(async (trx): Promise<Result<QueuedMail[]>> => {
      const latest = await lockLatestProof(trx, order.id);
      if (!latest || version > latest.version)
        return failure('not-found', `There is no proof ${version} for ${number}.`);
      if (version !== latest.version)
        return failure(
          'conflict',
          `Proof ${version} has been replaced by version ${latest.version}; answer the latest one.`,
        );
      if (latest.status !== 'sent') return failure('conflict', `You have already answered proof ${version}.`);
      const moved = await moveOrder(trx, {
        orderId: order.id,
        action: isApproved ? 'approve_proof' : 'request_changes',
        actor: 'customer',
        actorUserId: customer.id,
        note: answer.comment ?? null,
        payload: { proofVersion: version, pinCount: answer.pins.length },
        now,
      });
      if (!moved.ok) return moved;
      // Approving a proof that carries a new price makes it the order's price; the studio's charge takes it.
      if (isApproved)
        await adoptApprovedProofPrice(trx, {
          orderId: order.id,
          proofId: latest.id,
          proofVersion: version,
          actorUserId: customer.id,
          now,
        });
      await recordProofAnswer(trx, latest.id, {
        status: isApproved ? 'approved' : 'changes_requested',
        comment: answer.comment ?? null,
        pins: answer.pins,
        at: now,
      });
      // The messages the answer sends are queued with it, in this transaction.
      const shop = await shopScheduleOf(trx);
      const context = { appOrigin: deps.appOrigin, shopName: shop.name, number, orderId: order.id };
      const mails = [
        ...(isApproved ? [proofApprovedMail(context, customer.email, version)] : []),
        proofAnsweredStudioMail(context, shop.contactEmail, {
          version,
          isApproved,
          comment: answer.comment ?? null,
          pins: answer.pins,
        }),
      ];
      const queued: QueuedMail[] = [];
      for (const mail of mails) queued.push(await queueLoggedMail(trx, mail, now));
      return ok(queued);
    });
    if (!done.ok) return done;

    const mailDeps = { db, mailer: deps.mailer, now: deps.now };
    for (const mail of done.value) await sendQueuedMail(mailDeps, mail);
    return ok({ number, version });
  }

  return { list, get, proofImage, answerProof };
}

function withoutId<T extends { id: number }>(row: T): Omit<T, 'id'> {
  const copy: Partial<T> = { ...row };
  delete copy.id;
  return copy as Omit<T, 'id'>;
}

function noSuchOrder(number: string): Result<never> {
  return failure('not-found', `There is no order ${number}.`);
}

/** Held, charged and refunded amounts over every attempt, and why the latest attempt failed if it did. */
function paymentSummary(
  payments: PaymentRecord[],
  events: { type: string; note: string | null }[],
  needsPayment: boolean,
  now: Date,
): CustomerOrderResponse['payment'] {
  const held = payments.filter((p) => p.status === 'authorized' && (p.captureBefore === null || p.captureBefore > now));
  const latest = payments.at(-1);
  const failedNote = events.findLast((e) => e.type === 'payment_failed')?.note;
  const hasLapsed = !held.length && payments.some((p) => p.status === 'authorized');
  const waitingLink = latest?.method === 'payment_link' && latest.status === 'pending' ? latest.paymentPageUrl : null;
  let failureMessage: string | null = null;
  if (needsPayment && waitingLink)
    failureMessage = 'Your bank asked for you to confirm this payment yourself, so we could not charge your card.';
  else if (needsPayment && latest?.status === 'failed')
    failureMessage = failedNote ?? 'We could not open the payment page. Please try again.';
  else if (needsPayment && hasLapsed)
    failureMessage =
      'The hold on your card ran out before we could charge it. Please pay again to keep your order going.';
  return {
    heldCents: held.reduce((sum, p) => sum + p.authorizedCents, 0),
    chargedCents: payments.reduce((sum, p) => sum + p.capturedCents, 0),
    refundedCents: payments.reduce((sum, p) => sum + p.refundedCents, 0),
    holdExpiresAt:
      held
        .map((p) => p.captureBefore)
        .filter((d): d is Date => d !== null)
        .sort((a, b) => a.getTime() - b.getTime())[0]
        ?.toISOString() ?? null,
    failureMessage,
    isCardSaved: payments.some((p) => p.status === 'saved'),
    confirmPaymentUrl: needsPayment ? waitingLink : null,
  };
}

export type CustomerOrderService = ReturnType<typeof createCustomerOrderService>;
