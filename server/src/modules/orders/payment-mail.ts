/**
 * The customer's e-mails about the charge itself: the card was charged (by the studio's button, an off-session
 * charge of the kept card, or the customer's own payment on a link), or the bank wants the customer to confirm the
 * payment on a page we link to.
 */
import { orderPageUrl } from '../mail/mail-layout.ts';
import { formatMoneyText } from '../mail/money-text.ts';
import type { LoggedMail } from '../mail/order-mail.ts';
import { compose, type MailOrder } from './studio-order-mail.ts';

export function cardChargedMail(
  order: MailOrder,
  appOrigin: string,
  charge: { amountCents: number; heldCents: number | null },
): LoggedMail {
  const amount = formatMoneyText(charge.amountCents, order.currency);
  const released =
    charge.heldCents !== null && charge.heldCents > charge.amountCents
      ? [
          `That is less than the ${formatMoneyText(charge.heldCents, order.currency)} we held; the rest of the hold is released, and your bank may take a few days to show it.`,
        ]
      : [];
  return compose(order, 'card_charged', `We have charged ${amount} for ${order.number}`, [
    `Thank you for approving your proof. We have charged ${amount} to your card for order ${order.number} and started stitching.`,
    ...released,
    `Your order page: ${orderPageUrl(appOrigin, order.number)}`,
  ]);
}

export function confirmPaymentMail(
  order: MailOrder,
  payment: { amountCents: number; pageUrl: string; why: 'bank' | 'declined' | 'no_card' },
): LoggedMail {
  const amount = formatMoneyText(payment.amountCents, order.currency);
  const reason = {
    bank: 'Your bank asked for you to confirm this payment yourself, so we could not charge the card you gave us.',
    declined: 'Your card was not accepted for this payment, so nothing was charged.',
    no_card: 'The hold on your card ran out before we could charge it, so nothing was charged.',
  }[payment.why];
  return compose(order, 'payment_confirmation_needed', `Please confirm your payment of ${amount} for ${order.number}`, [
    `Your proof for ${order.number} is approved and we are ready to stitch. ${reason}`,
    `Please pay ${amount} here: ${payment.pageUrl}`,
    'The link is also on your order page. We start stitching as soon as the payment goes through.',
  ]);
}
