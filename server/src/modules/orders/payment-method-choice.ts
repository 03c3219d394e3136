import type { Db } from '../../db/knex.ts';
import { dueDateOf, planCardPayment, type CardPlan } from '../../engine/index.ts';
import { shopCalendarOf } from '../settings/settings-service.ts';
import { findOrderNeededBy } from './order-repo.ts';
import type { CheckoutMethod } from './checkout-session.ts';
import type { OrderStatus } from '../../contracts/order-status.ts';

/**
 * How the payment page takes the card for this order now. An approved order is charged at once (the customer pays
 * on the page); any other is held when its work is due before the hold would end, and otherwise only keeps the card
 * for the charge at approval (the shop's calendar gives the due date, `CARD_HOLD_WINDOW_DAYS` the hold's life).
 */
export async function chooseCheckoutMethod(
  db: Db,
  order: { id: number; status: OrderStatus },
  now: Date,
  holdWindowDays: number,
): Promise<{ method: CheckoutMethod; plan: CardPlan }> {
  const [calendar, neededBy] = await Promise.all([shopCalendarOf(db), findOrderNeededBy(db, order.id)]);
  const dueDate = dueDateOf({ neededBy, placedAtMs: now.getTime() }, calendar);
  const plan = planCardPayment({ dueDate, nowMs: now.getTime(), holdWindowDays, timeZone: calendar.timeZone });
  return { method: order.status === 'proof_approved' ? 'payment_link' : plan.method, plan };
}
