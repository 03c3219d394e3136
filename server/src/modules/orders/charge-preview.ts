import type { OrderDetailResponse } from '../../contracts/admin-orders.ts';
import { cardHeldOrderStatuses, isIn } from '../../contracts/order-status.ts';
import { chargeStepOf } from '../../engine/index.ts';
import { formatMoneyText } from '../mail/money-text.ts';

const day = (iso: string) =>
  new Date(iso).toLocaleDateString('en-US', { month: 'short', day: 'numeric', timeZone: 'UTC' });

/**
 * What the studio's charge button will do with the order's current total, in the studio's words: capture the
 * hold, capture less of it, charge the kept card, or send the customer a payment link. The same rule
 * (`chargeStepOf`) decides the charge itself.
 */
export function previewCharge(
  detail: Omit<OrderDetailResponse, 'studioActions' | 'charge'>,
  now: Date,
): OrderDetailResponse['charge'] {
  const { order, payments } = detail;
  if (!isIn(cardHeldOrderStatuses, order.status)) return null;
  if (payments.some((p) => p.capturedCents > 0)) return null;
  const hold = payments.findLast((p) => p.status === 'authorized');
  const hasSavedCard = payments.some((p) => p.isCardKept && ['authorized', 'saved', 'voided'].includes(p.status));
  if (!hold && !hasSavedCard) return null;
  const step = chargeStepOf({
    totalCents: order.totalCents,
    hold: hold
      ? { heldCents: hold.authorizedCents, captureBeforeMs: hold.captureBefore ? Date.parse(hold.captureBefore) : null }
      : null,
    hasSavedCard,
    nowMs: now.getTime(),
  });
  const money = (cents: number) => formatMoneyText(cents, order.currency);
  const amount = money(step.amountCents);
  const held = hold ? money(hold.authorizedCents) : '';
  const orLink = "if the customer's bank wants them to confirm it, they are e-mailed a link to pay instead.";
  let summary: string;
  switch (step.kind) {
    case 'capture':
      summary = `Charging takes ${amount} from the hold on the card${hold?.captureBefore ? ` (held until ${day(hold.captureBefore)})` : ''}.`;
      break;
    case 'capture_less':
      summary = `The total is now ${amount}, less than the ${held} held: charging takes ${amount} and releases the rest of the hold.`;
      break;
    case 'charge_saved_card':
      summary = {
        saved: `The card is saved, not held. Charging takes ${amount} from the saved card; ${orLink}`,
        hold_lapsed: `The hold ran out${hold?.captureBefore ? ` on ${day(hold.captureBefore)}` : ''}. Charging takes ${amount} from the saved card; ${orLink}`,
        more_than_held: `The total is now ${amount}, more than the ${held} held: charging releases the hold and takes ${amount} from the saved card; ${orLink}`,
      }[step.why];
      break;
    case 'ask_customer':
      summary = `No card is kept for a charge of ${amount}: charging e-mails the customer a link to pay it.`;
      break;
  }
  return { kind: step.kind, amountCents: step.amountCents, summary };
}
