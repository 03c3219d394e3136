/**
 * The order's state machine: every move an order can make, who may make it, and the reason a move is refused. It is
 * pure (no database, no clock) so every transition is tested on its own; `order-transitions.ts` applies a move
 * inside a transaction and writes the order event.
 */
import type { OrderStatus } from '../../contracts/order-status.ts';
import { approvedOrderStatuses, isIn } from '../../contracts/order-status.ts';
import type { Role } from '../../contracts/users.ts';

/** What happened, as the order events name it. */
export const orderActions = [
  'authorize',
  'send_proof',
  'request_changes',
  'approve_proof',
  'start_production',
  'mark_stitched',
  'ship',
  'cancel',
  'refund',
] as const;
export type OrderAction = (typeof orderActions)[number];

/** Who moves the order: a person by role, or the system (a verified payment webhook, an expiry). */
export type OrderActor = Role | 'system';

interface Move {
  from: readonly OrderStatus[];
  to: OrderStatus;
  by: readonly OrderActor[];
  /** The event type recorded for the move. */
  event: string;
}

const studio = ['staff', 'owner'] as const;

/**
 * The moves. Sending a proof again while the customer has not answered supersedes the earlier version, so
 * `send_proof` is allowed from `proof_sent` too. Cancelling after the card was charged is a refund instead.
 */
export const orderMoves: Readonly<Record<OrderAction, Move>> = {
  authorize: { from: ['awaiting_payment'], to: 'authorized', by: ['system'], event: 'payment_authorized' },
  send_proof: {
    from: ['authorized', 'proof_sent', 'changes_requested'],
    to: 'proof_sent',
    by: studio,
    event: 'proof_sent',
  },
  request_changes: { from: ['proof_sent'], to: 'changes_requested', by: ['customer'], event: 'changes_requested' },
  approve_proof: { from: ['proof_sent'], to: 'proof_approved', by: ['customer'], event: 'proof_approved' },
  // The system moves it when the provider reports a capture made outside the app (payment-capture.ts).
  start_production: {
    from: ['proof_approved'],
    to: 'in_production',
    by: [...studio, 'system'],
    event: 'payment_captured',
  },
  mark_stitched: { from: ['in_production'], to: 'stitched', by: studio, event: 'stitched' },
  ship: { from: ['stitched'], to: 'shipped', by: studio, event: 'shipped' },
  cancel: {
    from: ['awaiting_payment', 'authorized', 'proof_sent', 'changes_requested', 'proof_approved'],
    to: 'cancelled',
    by: [...studio, 'customer', 'system'],
    event: 'cancelled',
  },
  refund: { from: ['in_production', 'stitched', 'shipped'], to: 'refunded', by: studio, event: 'refunded' },
};

/** Statuses no move leaves. */
export const finalStatuses: readonly OrderStatus[] = ['cancelled', 'refunded'];

/** Why an order in `from` cannot take `action`, in words for the person who tried. */
function refusal(action: OrderAction, from: OrderStatus): string {
  if (finalStatuses.includes(from))
    return `This order is ${from === 'cancelled' ? 'cancelled' : 'refunded'}; nothing more can be done to it.`;
  switch (action) {
    case 'authorize':
      return 'The card is already held for this order.';
    case 'send_proof':
      return from === 'awaiting_payment'
        ? 'The customer has not paid yet; send the proof once the card is held.'
        : 'The proof has already been approved; it cannot be replaced now.';
    case 'request_changes':
    case 'approve_proof':
      return isIn(approvedOrderStatuses, from)
        ? 'This proof has already been approved.'
        : 'There is no proof waiting for an answer on this order.';
    case 'start_production':
      return 'The customer has not approved a proof yet, so the card cannot be charged.';
    case 'mark_stitched':
      return 'Only an order on the machine can be marked stitched.';
    case 'ship':
      return 'Only a stitched order can be shipped.';
    case 'cancel':
      return 'The card has been charged for this order: refund it instead of cancelling.';
    case 'refund':
      return 'Nothing has been charged for this order yet: cancel it to release the card.';
  }
}

export type PlannedMove =
  { ok: true; to: OrderStatus; event: string } | { ok: false; reason: string; kind: 'conflict' | 'forbidden' };

/** Where `action` takes an order in `from` when `actor` asks, or why it may not. */
export function planOrderMove(from: OrderStatus, action: OrderAction, actor: OrderActor): PlannedMove {
  const move = orderMoves[action];
  if (!move.by.includes(actor)) {
    const who =
      move.by.includes('customer') && !move.by.includes('staff')
        ? 'the customer'
        : move.by.includes('staff')
          ? 'the studio'
          : 'a confirmed payment';
    return { ok: false, kind: 'forbidden', reason: `Only ${who} can do that.` };
  }
  if (!move.from.includes(from)) return { ok: false, kind: 'conflict', reason: refusal(action, from) };
  return { ok: true, to: move.to, event: move.event };
}

/** The actions `actor` could take on an order in `status` now, for the apps' buttons. */
export function availableOrderActions(status: OrderStatus, actor: OrderActor): OrderAction[] {
  return orderActions.filter((action) => planOrderMove(status, action, actor).ok);
}
