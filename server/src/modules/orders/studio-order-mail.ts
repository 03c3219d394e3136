/**
 * The messages the studio's actions send a customer: plain words, the order number, and a link to the order's page
 * on the storefront, where the proof, the payment and the parcel's progress are shown.
 */
import { shippedWords } from '../../contracts/order-status.ts';
import { mailBodies, orderPageUrl } from '../mail/mail-layout.ts';
import { formatMoneyText } from '../mail/money-text.ts';
import type { LoggedMail } from '../mail/order-mail.ts';

export interface MailOrder {
  id: number;
  number: string;
  customerName: string;
  customerEmail: string;
  currency: string;
  /** Signs the message. */
  shopName: string;
}

const firstName = (name: string) => name.split(/\s+/)[0] || name;

/** A message to the order's customer: greeting, paragraphs, the shop's name. */
export function compose(order: MailOrder, template: string, subject: string, paragraphs: string[]): LoggedMail {
  return {
    to: order.customerEmail,
    subject,
    ...mailBodies([`Hello ${firstName(order.customerName)},`, ...paragraphs, `— ${order.shopName}`]),
    template,
    orderId: order.id,
  };
}

export function proofReadyMail(
  order: MailOrder,
  appOrigin: string,
  proof: { version: number; message: string; newPrice?: { totalCents: number; previousTotalCents: number } },
): LoggedMail {
  const price = proof.newPrice;
  return compose(order, 'proof_ready', `Your proof for ${order.number} is ready`, [
    proof.message,
    ...(price
      ? [
          `With this proof the order comes to ${formatMoneyText(price.totalCents, order.currency)} instead of ${formatMoneyText(price.previousTotalCents, order.currency)}; approving the proof agrees to the new price.`,
        ]
      : []),
    `Look at proof ${proof.version} and approve it, or point at anything you would like changed: ${orderPageUrl(appOrigin, order.number)}`,
    'Nothing is stitched and your card is not charged until you approve.',
  ]);
}

export function payAgainMail(order: MailOrder, appOrigin: string): LoggedMail {
  return compose(order, 'payment_lapsed', `Please confirm your payment for ${order.number}`, [
    'Your card was held for this order, but the hold ran out before we could start stitching, so nothing was charged.',
    `To go ahead, please confirm your card again on your order page: ${orderPageUrl(appOrigin, order.number)}`,
    'Your approved proof is kept; we start stitching as soon as the card is held again.',
  ]);
}

export function orderCancelledMail(
  order: MailOrder,
  appOrigin: string,
  reason: string,
  wasCardReleased: boolean,
): LoggedMail {
  return compose(order, 'order_cancelled', `${order.number} has been cancelled`, [
    `We have cancelled order ${order.number}: ${reason}`,
    wasCardReleased
      ? 'The hold on your card has been released, so nothing was charged.'
      : 'Nothing was charged for this order.',
    `Your order page: ${orderPageUrl(appOrigin, order.number)}`,
  ]);
}

export function refundIssuedMail(
  order: MailOrder,
  appOrigin: string,
  refund: { amountCents: number; isFull: boolean; reason: string },
): LoggedMail {
  const amount = formatMoneyText(refund.amountCents, order.currency);
  return compose(order, 'refund_issued', `A refund of ${amount} for ${order.number}`, [
    `We have refunded ${amount}${refund.isFull ? ', the whole order,' : ''} to your card: ${refund.reason}`,
    'Banks usually take 5 to 10 days to show it on your statement.',
    `Your order page: ${orderPageUrl(appOrigin, order.number)}`,
  ]);
}

/** Posted with its carrier and tracking number; a pick-up order is handed over at the studio instead. */
export function orderShippedMail(
  order: MailOrder,
  appOrigin: string,
  shipment: { method: 'delivery' | 'pickup'; carrier: string | null; trackingNumber: string | null },
): LoggedMail {
  const page = `Your order page: ${orderPageUrl(appOrigin, order.number)}`;
  if (shipment.method === 'pickup') {
    return compose(order, 'order_shipped', `${order.number} has been ${shippedWords.pickup.toLowerCase()}`, [
      'Your embroidered order has been handed over at the studio. Thank you!',
      page,
    ]);
  }
  const tracking = shipment.trackingNumber
    ? `${shipment.carrier ? `Carrier: ${shipment.carrier}. ` : ''}Tracking number: ${shipment.trackingNumber}`
    : shipment.carrier
      ? `It is with ${shipment.carrier}, without a tracking number; it usually arrives within a week.`
      : 'The parcel has no tracking number; it usually arrives within a week.';
  return compose(order, 'order_shipped', `${order.number} has been ${shippedWords.delivery.toLowerCase()}`, [
    `Your embroidered order has been packed and ${shippedWords.delivery.toLowerCase()}.`,
    tracking,
    page,
  ]);
}
