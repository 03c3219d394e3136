/**
 * How an order's card is taken. A hold (an authorization) lasts a limited time; the studio charges at proof approval,
 * which may come as late as the work's due date. So an order due before its hold would end is held, and one due on
 * or after that day keeps the card for a later charge instead. At the charge the order's current total decides:
 * a live hold covering it is captured (in part when the total fell), anything else charges the kept card.
 */
import { shopDayOf } from './shop-calendar.ts';

const DAY_MS = 86_400_000;

export type CardMethod = 'hold' | 'saved_card';

export interface CardPlan {
  method: CardMethod;
  /** The shop's day a hold placed now would end (the provider's lifetime for an uncaptured card authorization). */
  holdEndsOn: string;
}

/** Hold or keep the card, from the order's due date (YYYY-MM-DD, or null while unknown) and the hold's lifetime. */
export function planCardPayment(input: {
  dueDate: string | null;
  nowMs: number;
  holdWindowDays: number;
  timeZone: string;
}): CardPlan {
  const holdEndsOn = shopDayOf(input.nowMs + input.holdWindowDays * DAY_MS, input.timeZone);
  // The hold ends part-way through its last day, so work due that day is already at risk.
  const method = input.dueDate !== null && input.dueDate >= holdEndsOn ? 'saved_card' : 'hold';
  return { method, holdEndsOn };
}

/** What the studio's charge does now. */
export type ChargeStep =
  | { kind: 'capture'; amountCents: number }
  | { kind: 'capture_less'; amountCents: number; heldCents: number }
  | { kind: 'charge_saved_card'; amountCents: number; why: 'saved' | 'hold_lapsed' | 'more_than_held' }
  | { kind: 'ask_customer'; amountCents: number; why: 'hold_lapsed' | 'more_than_held' | 'no_card' };

/** The charge of the order's current total, given the live hold (if any) and whether a card is kept for later. */
export function chargeStepOf(input: {
  totalCents: number;
  hold: { heldCents: number; captureBeforeMs: number | null } | null;
  hasSavedCard: boolean;
  nowMs: number;
}): ChargeStep {
  const { totalCents: amountCents, hold, hasSavedCard, nowMs } = input;
  const isHoldLive = hold !== null && (hold.captureBeforeMs === null || hold.captureBeforeMs > nowMs);
  if (hold && isHoldLive && amountCents === hold.heldCents) return { kind: 'capture', amountCents };
  if (hold && isHoldLive && amountCents < hold.heldCents)
    return { kind: 'capture_less', amountCents, heldCents: hold.heldCents };
  const why = hold === null ? (hasSavedCard ? 'saved' : 'no_card') : isHoldLive ? 'more_than_held' : 'hold_lapsed';
  if (hasSavedCard) return { kind: 'charge_saved_card', amountCents, why: why === 'no_card' ? 'saved' : why };
  return { kind: 'ask_customer', amountCents, why: why === 'saved' ? 'no_card' : why };
}
