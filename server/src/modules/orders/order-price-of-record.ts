import type { Knex } from 'knex';
import { readProofPrice } from './proof-repo.ts';
import { readOrderTotal, writeOrderTotals } from './order-design-repo.ts';
import { recordOrderEvent } from './studio-order-repo.ts';

/**
 * The one place an order's price of record changes after checkout: the customer approved a proof whose price
 * differs from the order's total (a digitized picture came to more or fewer stitches, or the studio changed the
 * design). Runs in the approval's transaction, with the order row locked by the move; the studio's charge then
 * takes the new total. Returns the new total, or null when the price stayed as it was.
 */
export async function adoptApprovedProofPrice(
  trx: Knex.Transaction,
  approval: {
    orderId: number;
    proofId: number;
    proofVersion: number;
    actorUserId: number;
    now: Date;
  },
): Promise<number | null> {
  const [price, currentTotalCents] = await Promise.all([
    readProofPrice(trx, approval.proofId),
    readOrderTotal(trx, approval.orderId),
  ]);
  if (!price || price.totalCents === currentTotalCents) return null;
  await writeOrderTotals(trx, approval.orderId, price);
  await recordOrderEvent(trx, {
    orderId: approval.orderId,
    type: 'price_changed',
    actorUserId: approval.actorUserId,
    payload: {
      proofVersion: approval.proofVersion,
      fromTotalCents: currentTotalCents,
      amountCents: price.totalCents,
    },
    now: approval.now,
  });
  return price.totalCents;
}
