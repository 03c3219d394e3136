/**
 * Replays an order's steps into the rows the app would have written along the way: order events, proofs, the
 * payment and the e-mails, and the order's final status. Ids come from shared counters so that every run of the
 * seeds numbers the rows the same way.
 */
import type { OrderStatus } from '../../server/src/contracts/admin-overview.ts';
import type { CommentPin, OrderStep } from './order-timeline.ts';
import type { OrderSpec } from './orders.ts';
import { addDays, at } from './seed-time.ts';
import { userIds, type CustomerKey } from './accounts.ts';
import { seedMailBodies } from './mail-bodies.ts';

type PaymentStatus = 'none' | 'authorized' | 'captured' | 'partially_refunded' | 'refunded' | 'voided';
type Row = Record<string, unknown>;

export interface OrderContext {
  order: OrderSpec;
  customer: CustomerKey;
  customerEmail: string;
  totalCents: number;
  currency: string;
  /** Shared across orders: the next id for each table. */
  ids: { event: number; proof: number; email: number };
}

export interface OrderHistory {
  status: OrderStatus;
  paymentStatus: PaymentStatus;
  placedAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
  events: Row[];
  proofs: Row[];
  payment: Row;
  emails: Row[];
}

/** Status each step moves the order to; steps not listed leave the status as it is. */
const nextStatus: Partial<Record<OrderStep['type'], OrderStatus>> = {
  order_created: 'awaiting_payment',
  payment_authorized: 'authorized',
  proof_sent: 'proof_sent',
  changes_requested: 'changes_requested',
  proof_approved: 'proof_approved',
  payment_captured: 'in_production',
  stitched: 'stitched',
  shipped: 'shipped',
  cancelled: 'cancelled',
};

/** Card authorizations for online payments lapse after 7 days unless captured (Stripe, trade-facts). */
const authorizationDays = 7;

const seq = (n: number) => String(n).padStart(4, '0');

/** A failed e-mail is sent again five minutes later. */
const retryDelayMs = 5 * 60_000;

export function replayOrder(context: OrderContext): OrderHistory {
  const { order, customer, totalCents } = context;
  const ref = seq(order.id);
  const paymentIntentId = `pi_seed_${ref}`;
  const events: Row[] = [];
  const proofs: Row[] = [];
  const emails: Row[] = [];
  let status: OrderStatus | null = null;
  let paymentStatus: PaymentStatus = 'none';
  let authorizedAt: Date | null = null;
  let capturedAt: Date | null = null;
  let refundedCents = 0;
  let refunds = 0;

  /** Records an event; a step with a status in nextStatus also moves the order. */
  const event = (
    type: string,
    when: Date,
    actor: number | null,
    extra: { note?: string; payload?: object; to?: OrderStatus } = {},
  ) => {
    const from = status;
    const to = extra.to ?? nextStatus[type as OrderStep['type']];
    if (to) status = to;
    events.push({
      id: context.ids.event++,
      order_id: order.id,
      actor_user_id: actor,
      type,
      from_status: to ? from : null,
      to_status: to ?? null,
      note: extra.note ?? null,
      payload: extra.payload ? JSON.stringify(extra.payload) : null,
      created_at: when,
    });
  };
  const mail = (stamp: Date, template: string, subject: string, failure?: string) => {
    const id = context.ids.email++;
    emails.push({
      id,
      to_email: context.customerEmail,
      subject,
      template,
      order_id: order.id,
      status: failure ? 'failed' : 'sent',
      provider_message_id: failure ? null : `<seed-${seq(id)}@wrenandbobbin.test>`,
      error: failure ?? null,
      attempts: 1,
      ...seedMailBodies(template, order.number),
      created_at: stamp,
      updated_at: stamp,
    });
  };
  const latestProof = () => proofs[proofs.length - 1];
  const answerProof = (when: Date, answer: 'approved' | 'changes_requested', pins: CommentPin[]) => {
    const proof = latestProof();
    Object.assign(proof, { status: answer, comment_pins: JSON.stringify(pins), responded_at: when, updated_at: when });
    return Number(proof.version);
  };

  for (const step of order.steps) {
    const when = at(step.at);
    switch (step.type) {
      case 'order_created':
        event(step.type, when, userIds[customer]);
        break;
      case 'payment_authorized':
        authorizedAt = when;
        paymentStatus = 'authorized';
        event(step.type, when, null, { payload: { paymentIntentId, amountCents: totalCents } });
        mail(when, 'order_received', `We have your order ${order.number}`);
        break;
      case 'proof_sent': {
        const previous = latestProof();
        if (previous?.status === 'sent') Object.assign(previous, { status: 'superseded', updated_at: when });
        const version = proofs.length + 1;
        proofs.push({
          id: context.ids.proof++,
          order_id: order.id,
          version,
          status: 'sent',
          image_png: null,
          message: step.message,
          comment_pins: JSON.stringify([]),
          sent_by_user_id: userIds[step.by],
          responded_at: null,
          created_at: when,
          updated_at: when,
        });
        event(step.type, when, userIds[step.by], { payload: { proofVersion: version } });
        const subject = `Your proof for ${order.number} is ready`;
        if (step.isMailFailing) {
          mail(when, 'proof_ready', subject, 'SMTP 451 4.3.0 Temporary local problem, try again later');
          mail(new Date(when.getTime() + retryDelayMs), 'proof_ready', subject);
        } else {
          mail(when, 'proof_ready', subject);
        }
        break;
      }
      case 'changes_requested': {
        const version = answerProof(when, 'changes_requested', step.pins);
        event(step.type, when, userIds[customer], {
          note: step.note,
          payload: { proofVersion: version, pinCount: step.pins.length },
        });
        break;
      }
      case 'proof_approved': {
        const version = answerProof(when, 'approved', []);
        event(step.type, when, userIds[customer], { note: step.note, payload: { proofVersion: version } });
        break;
      }
      case 'payment_captured':
        capturedAt = when;
        paymentStatus = 'captured';
        event(step.type, when, userIds[step.by], { payload: { paymentIntentId, amountCents: totalCents } });
        break;
      case 'note_added':
        event(step.type, when, userIds[step.by], { note: step.note });
        break;
      case 'stitched':
        event(step.type, when, userIds[step.by]);
        break;
      case 'shipped':
        event(step.type, when, userIds[step.by], {
          payload: { carrier: 'Parcel post', trackingNumber: step.trackingNumber },
        });
        mail(when, 'order_shipped', `${order.number} is on its way`);
        break;
      case 'refunded': {
        const amountCents = step.amountCents ?? totalCents - refundedCents;
        refundedCents += amountCents;
        refunds += 1;
        paymentStatus = refundedCents === totalCents ? 'refunded' : 'partially_refunded';
        // A full refund closes the order; a partial one (goodwill, say) leaves it where it was.
        const to = paymentStatus === 'refunded' ? 'refunded' : undefined;
        event(step.type, when, userIds[step.by], {
          note: step.note,
          payload: { refundId: `re_seed_${ref}_${refunds}`, amountCents },
          ...(to && { to }),
        });
        break;
      }
      case 'cancelled':
        event(step.type, when, step.by === 'customer' ? userIds[customer] : userIds[step.by], { note: step.note });
        mail(when, 'order_cancelled', `${order.number} has been cancelled`);
        // An authorization that was never captured is released straight away.
        if (paymentStatus === 'authorized') {
          paymentStatus = 'voided';
          event('payment_voided', when, null, { payload: { paymentIntentId } });
        }
        break;
    }
  }
  if (!status) throw new Error(`Seed data: order ${order.number} has no steps`);
  const createdAt = at(order.steps[0].at);
  const updatedAt = at(order.steps[order.steps.length - 1].at);
  const wasAuthorized = authorizedAt !== null;
  return {
    status,
    paymentStatus,
    placedAt: authorizedAt,
    createdAt,
    updatedAt,
    events,
    proofs,
    emails,
    payment: {
      id: order.id,
      order_id: order.id,
      provider: 'stripe',
      checkout_session_id: `cs_seed_${ref}`,
      payment_intent_id: wasAuthorized ? paymentIntentId : null,
      status: wasAuthorized ? paymentStatus : 'pending',
      amount_authorized_cents: wasAuthorized ? totalCents : 0,
      amount_captured_cents: capturedAt ? totalCents : 0,
      amount_refunded_cents: refundedCents,
      currency: context.currency,
      capture_before: authorizedAt ? addDays(authorizedAt, authorizationDays) : null,
      authorized_at: authorizedAt,
      captured_at: capturedAt,
      created_at: createdAt,
      updated_at: updatedAt,
    },
  };
}
