import { describe, expect, it } from 'vitest';
import { orderStatuses, type OrderStatus } from '../../../server/src/contracts/order-status.ts';
import {
  availableOrderActions,
  finalStatuses,
  orderActions,
  planOrderMove,
  type OrderAction,
  type OrderActor,
} from '../../../server/src/modules/orders/order-flow.ts';

const actors: OrderActor[] = ['customer', 'staff', 'owner', 'system'];

/**
 * Every legal move, written out by hand from the lifecycle (quoted → awaiting payment → authorized → proof sent ⇄
 * changes requested → proof approved → in production → stitched → shipped; cancelled before the charge, refunded
 * after it). Anything not in this list must be refused.
 */
const legal: [OrderStatus, OrderAction, OrderActor[], OrderStatus][] = [
  ['awaiting_payment', 'authorize', ['system'], 'authorized'],
  ['authorized', 'send_proof', ['staff', 'owner'], 'proof_sent'],
  ['proof_sent', 'send_proof', ['staff', 'owner'], 'proof_sent'],
  ['changes_requested', 'send_proof', ['staff', 'owner'], 'proof_sent'],
  ['proof_sent', 'request_changes', ['customer'], 'changes_requested'],
  ['proof_sent', 'approve_proof', ['customer'], 'proof_approved'],
  ['proof_approved', 'start_production', ['staff', 'owner', 'system'], 'in_production'],
  ['in_production', 'mark_stitched', ['staff', 'owner'], 'stitched'],
  ['stitched', 'ship', ['staff', 'owner'], 'shipped'],
  ...(['awaiting_payment', 'authorized', 'proof_sent', 'changes_requested', 'proof_approved'] as const).map(
    (from): [OrderStatus, OrderAction, OrderActor[], OrderStatus] => [from, 'cancel', actors, 'cancelled'],
  ),
  ...(['in_production', 'stitched', 'shipped'] as const).map(
    (from): [OrderStatus, OrderAction, OrderActor[], OrderStatus] => [from, 'refund', ['staff', 'owner'], 'refunded'],
  ),
];

function expectedTarget(from: OrderStatus, action: OrderAction, actor: OrderActor): OrderStatus | undefined {
  const row = legal.find(([f, a, by]) => f === from && a === action && by.includes(actor));
  return row?.[3];
}

describe('the order state machine', () => {
  for (const from of orderStatuses) {
    for (const action of orderActions) {
      for (const actor of actors) {
        const target = expectedTarget(from, action, actor);
        it(`when ${actor} asks to ${action} an order that is ${from}, then it is ${target ? `moved to ${target}` : 'refused'}`, () => {
          const move = planOrderMove(from, action, actor);
          if (target) {
            expect(move).toMatchObject({ ok: true, to: target });
          } else {
            expect(move.ok).toBe(false);
            if (!move.ok) {
              expect(move.reason.length).toBeGreaterThan(10);
              // A role that may take the action elsewhere is refused for the status (409); another role is refused outright (403).
              const mayEverDoIt = legal.some(([, a, by]) => a === action && by.includes(actor));
              expect(move.kind).toBe(mayEverDoIt ? 'conflict' : 'forbidden');
            }
          }
        });
      }
    }
  }

  it('when an order is cancelled or refunded, then no one can move it again', () => {
    for (const status of finalStatuses)
      for (const actor of actors) expect(availableOrderActions(status, actor)).toEqual([]);
  });

  it('when the studio looks at an approved proof, then charging and cancelling are its choices', () => {
    expect(availableOrderActions('proof_approved', 'staff')).toEqual(['start_production', 'cancel']);
    expect(availableOrderActions('proof_sent', 'customer')).toEqual(['request_changes', 'approve_proof', 'cancel']);
  });

  it('when a customer tries to cancel after the charge, then the reason says to ask for a refund instead', () => {
    expect(planOrderMove('in_production', 'cancel', 'staff')).toMatchObject({
      ok: false,
      reason: expect.stringContaining('refund'),
    });
  });
});
