/**
 * The e-mails the customer's side of an order sends, as plain text with a light HTML copy. Each names the order
 * and links to its page, where everything else lives.
 */
import { mailBodies, orderPageUrl, studioOrderPageUrl } from '../mail/mail-layout.ts';
import type { LoggedMail } from '../mail/order-mail.ts';
import { formatCustomerMailDate } from '../mail/day-text.ts';

interface MailContext {
  appOrigin: string;
  shopName: string;
  number: string;
  orderId: number;
}

function compose(
  context: MailContext,
  to: string,
  template: string,
  subject: string,
  paragraphs: string[],
): LoggedMail {
  const link = orderPageUrl(context.appOrigin, context.number);
  return {
    to,
    subject,
    ...mailBodies([...paragraphs, `See your order: ${link}`, `— ${context.shopName}`]),
    template,
    orderId: context.orderId,
  };
}

/**
 * The order is in and the card held. `due` is its due date by the shop's one rule: the day asked for, or the lead
 * time counted in the shop's working days from today.
 */
export function orderPlacedMail(
  context: MailContext,
  to: string,
  totalText: string,
  due: { date: string; isAskedFor: boolean } | null,
  card: 'held' | 'saved' = 'held',
): LoggedMail {
  const when = due
    ? due.isAskedFor
      ? [`We have noted that you need it by ${formatCustomerMailDate(due.date)}.`]
      : [`We aim to have it ready by ${formatCustomerMailDate(due.date)}.`]
    : [];
  return compose(context, to, 'order_placed', `We have your order ${context.number}`, [
    `Thank you! Your order ${context.number} is in.`,
    card === 'held'
      ? `We have put a hold of ${totalText} on your card. Nothing is charged until you approve the proof of your design.`
      : `Your card is saved with our payment provider and nothing has been taken yet. A hold would run out before your order is due, so we charge the order's total (${totalText} now) when you approve the proof of your design.`,
    ...when,
    'Next, we draw a proof of your design on the garment and e-mail you when it is ready to look at.',
  ]);
}

export function proofApprovedMail(context: MailContext, to: string, version: number): LoggedMail {
  return compose(context, to, 'proof_approved', `You approved the proof for ${context.number}`, [
    `Thank you for approving version ${version} of your proof for ${context.number}.`,
    'We now charge your card the order’s total and start stitching. We will e-mail you when it ships.',
  ]);
}

/**
 * The studio hears of every answer, with the customer's words in full: pins left on an approved proof are notes the
 * studio must read before stitching. It links to the order in the studio app.
 */
export function proofAnsweredStudioMail(
  context: MailContext,
  to: string,
  answer: { version: number; isApproved: boolean; comment: string | null; pins: { comment: string }[] },
): LoggedMail {
  const what = answer.isApproved ? 'approved' : 'asked for changes to';
  const pinned = answer.pins.map((pin, index) => `Pin ${index + 1}: “${pin.comment}”`);
  return {
    to,
    subject: `${context.number}: the customer ${what} proof ${answer.version}`,
    ...mailBodies([
      `The customer ${what} proof version ${answer.version} of ${context.number}.`,
      ...(answer.comment ? [`Their comment: “${answer.comment}”`] : []),
      ...(pinned.length > 0
        ? [
            answer.isApproved
              ? `They approved with ${pinned.length === 1 ? 'a note' : `${pinned.length} notes`} pinned to the picture; read ${pinned.length === 1 ? 'it' : 'them'} before stitching:`
              : `They pinned ${pinned.length === 1 ? 'a comment' : `${pinned.length} comments`} to the picture:`,
            ...pinned,
          ]
        : []),
      `Open the order in the studio: ${studioOrderPageUrl(context.appOrigin, context.number)}`,
    ]),
    template: answer.isApproved ? 'proof_approved_studio' : 'changes_requested_studio',
    orderId: context.orderId,
  };
}

export function orderCancelledMail(context: MailContext, to: string, wasHeld: boolean): LoggedMail {
  return compose(context, to, 'order_cancelled', `${context.number} has been cancelled`, [
    `Your order ${context.number} is cancelled, as you asked.`,
    wasHeld ? 'The hold on your card is released; your bank may take a few days to show it.' : 'Nothing was charged.',
  ]);
}
