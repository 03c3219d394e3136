import { isDeepStrictEqual } from 'node:util';
import { cardHeldOrderStatuses, isIn, type OrderStatus } from '../../contracts/order-status.ts';
import type Stripe from 'stripe';
import type { Db } from '../../db/knex.ts';
import type { Mailer } from '../../integrations/mailer.ts';
import { findCustomerDesign } from '../designs/design-service.ts';
import { shopScheduleOf } from '../settings/settings-service.ts';
import { shippingRatesOf } from '../settings/shipping-settings-service.ts';
import { rememberAddress } from './customer-address-repo.ts';
import { checkShippingChoice } from './shipping-at-checkout.ts';
import {
  describeDesignForOrder,
  findCustomerOrder,
  findPlacedOrder,
  insertOrder,
  insertOrderNote,
  insertPendingPayment,
  listPayments,
  nextOrderNumber,
  readOrderDescription,
  syncOrderPaymentStatus,
  updatePayment,
  type OrderRecord,
  type PaymentRecord,
} from './order-repo.ts';
import { restoreDesign } from '../../contracts/designs.ts';
import { needsSafetyAcknowledgement, shopDayOf } from '../../engine/index.ts';
import type { CheckoutStartedResponse, PlaceOrderRequest } from '../../contracts/orders.ts';
import type { CurrentUser } from '../../contracts/users.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import { formatMoneyText } from '../mail/money-text.ts';
import { orderPageUrl } from '../mail/mail-layout.ts';
import { openCheckoutSession, providerCustomerFor } from './checkout-session.ts';
import { findProviderCustomer } from './kept-card-repo.ts';
import { chooseCheckoutMethod } from './payment-method-choice.ts';
import { moveOrder } from './order-transitions.ts';
import { queueLoggedMail, sendQueuedMail } from '../mail/order-mail.ts';
import { orderCancelledMail } from './customer-order-mail.ts';
import { findStoredQuote, type StoredQuote, type StoredQuoteService } from '../quotes/stored-quote-service.ts';

export interface CheckoutDeps {
  db: Db;
  stripe: Stripe;
  mailer: Mailer;
  storedQuotes: StoredQuoteService;
  appOrigin: string;
  /** How long a card hold lasts (`CARD_HOLD_WINDOW_DAYS`). */
  holdWindowDays: number;
  now: () => Date;
  log: (line: string) => void;
}

/**
 * True when the order needs the customer to pay: still awaiting payment (a declined card, an abandoned checkout),
 * or placed but with no hold left on the card (the authorization lapsed before the studio charged it).
 */
export function isPaymentNeeded(order: Pick<OrderRecord, 'status'>, payments: PaymentRecord[], now: Date): boolean {
  if (order.status === 'awaiting_payment') return true;
  if (!isIn(cardHeldOrderStatuses, order.status as OrderStatus)) return false;
  // A payment link is waiting: the bank wanted the customer to confirm the charge themselves.
  if (payments.at(-1)?.method === 'payment_link' && payments.at(-1)?.status === 'pending') return true;
  return !payments.some(
    (p) =>
      p.status === 'saved' ||
      (p.status === 'authorized' && (p.paymentMethodId !== null || p.captureBefore === null || p.captureBefore > now)),
  );
}

/** Checkout: an order from a stored quote, the card held through the payment provider, and cancelling before a charge. */
export function createCheckoutService(deps: CheckoutDeps) {
  const { db } = deps;
  const mailDeps = { db, mailer: deps.mailer, now: deps.now };

  /**
   * Places the order from the customer's stored quote and opens the hosted payment page. Every figure is the
   * quote's. A quote that has expired, or that needs a rush to be ready by the date asked for, is priced again
   * and the customer is asked to confirm the new total (409 with both totals and the new quote id).
   */
  async function place(customer: CurrentUser, request: PlaceOrderRequest): Promise<Result<CheckoutStartedResponse>> {
    const quote = await findStoredQuote(db, request.quoteId);
    if (!quote || quote.customerId !== customer.id)
      return failure('not-found', `There is no quote ${request.quoteId}.`, {
        quoteId: 'Price your design again before ordering',
      });
    const design = await findCustomerDesign(db, { id: request.designId, customerId: customer.id });
    if (!design)
      return failure('not-found', `There is no design ${request.designId}.`, {
        designId: 'Choose one of your saved designs',
      });
    const restored = restoreDesign(design.document);
    const isSameDesign =
      (quote.designId === null || quote.designId === design.id) &&
      quote.input.garmentId === design.garmentId &&
      quote.input.sizeId === design.sizeId &&
      restored.success &&
      isDeepStrictEqual(quote.input.document, restored.data);
    if (!isSameDesign) {
      return failure(
        'conflict',
        'This price was worked out for another version of the design or another size. Price the design again to order it.',
        { quoteId: 'Price your design again before ordering' },
      );
    }

    const cautions = await deps.storedQuotes.cautionsOf(quote);
    if (needsSafetyAcknowledgement(cautions) && request.hasReadSafetyNotes !== true) {
      const titles = cautions.filter((caution) => caution.severity !== 'info').map((caution) => caution.title);
      const message = `Please read the safety notes for this garment (${titles.join('; ')}) and tick that you have read them before paying.`;
      return failure('needs-acknowledgement', message, {
        hasReadSafetyNotes: 'Tick that you have read the safety notes',
      });
    }

    const shipping = checkShippingChoice(quote, request.shippingMethod, await shippingRatesOf(db));
    if (!shipping.ok) return shipping;

    const dates = await deps.storedQuotes.readyDatesToday();
    const shop = await shopScheduleOf(db);
    const today = shopDayOf(deps.now().getTime(), shop.timezone);
    if (request.neededBy < today)
      return failure('invalid', 'Choose a date from today on.', { neededBy: 'Choose a date from today on' });
    if (request.neededBy < dates.earliestRushDate) {
      const message = `We can't have it ready by then, even as a rush. The earliest is ${dates.earliestRushDate}.`;
      return failure('conflict', message, { neededBy: message }, { reason: 'too-soon', ...dates });
    }
    // The same checkout sent again (a double click, a retry after a lost answer) finds the order it made.
    const placement = { quoteId: quote.id, designId: design.id };
    const placed = await findPlacedOrder(db, customer.id, placement);
    if (placed) return answerPlaced(customer, placed);

    const needsRush = request.neededBy < dates.earliestReadyDate && !quote.isRush;
    const hasExpired = quote.expiresAt.getTime() <= deps.now().getTime();
    if (needsRush || hasExpired) return repriced(quote, { needsRush, hasExpired, dates });

    const now = deps.now();
    const description = await describeDesignForOrder(db, design);
    const created = await db.transaction(async (trx) => {
      const number = await nextOrderNumber(trx);
      const orderId = await insertOrder(trx, {
        number,
        customerId: customer.id,
        quoteId: quote.id,
        subtotalCents: quote.subtotalCents,
        shippingCents: quote.shippingCents,
        shippingMethod: shipping.value,
        taxCents: quote.taxCents,
        totalCents: quote.totalCents,
        currency: quote.currency,
        neededBy: request.neededBy,
        shipTo: request.shipTo,
        note: request.note ?? null,
        item: { designId: design.id, sizeId: design.sizeId, quantity: quote.quantity, description },
        createdAt: now,
      });
      if (orderId === undefined) return undefined;
      // Offered again at the customer's next checkout, whichever way this parcel goes.
      await rememberAddress(trx, customer.id, request.shipTo, now);
      if (needsSafetyAcknowledgement(cautions)) {
        await insertOrderNote(trx, {
          orderId,
          type: 'safety_notes_read',
          actorUserId: customer.id,
          payload: { codes: cautions.filter((caution) => caution.severity !== 'info').map((caution) => caution.code) },
          at: now,
        });
      }
      const paymentId = await insertPendingPayment(trx, { id: orderId, currency: quote.currency }, now);
      return { orderId, number, paymentId };
    });
    if (!created) {
      // Another request for the same quote and design committed first: answer with its order.
      const first = await findPlacedOrder(db, customer.id, placement);
      if (!first) throw new Error(`The order for quote ${quote.id} was taken and then not found.`);
      return answerPlaced(customer, first);
    }
    const checkoutUrl = await paymentPageOrOrderPage(
      {
        id: created.orderId,
        status: 'awaiting_payment',
        number: created.number,
        totalCents: quote.totalCents,
        currency: quote.currency,
        description,
        customerEmail: customer.email,
      },
      created.paymentId,
    );
    return ok({ number: created.number, checkoutUrl });
  }

  /**
   * The answer to a checkout that was placed before: the same 201 with the order's payment page. A pending attempt
   * opens its page again (the payment row keys the provider's request, so the first session comes back), an order
   * with no attempt left opens a new one, and an order that needs no payment sends the browser to its own page.
   */
  async function answerPlaced(customer: CurrentUser, order: OrderRecord): Promise<Result<CheckoutStartedResponse>> {
    if (order.status === 'cancelled') {
      return failure(
        'conflict',
        `Order ${order.number} was placed from this price and then cancelled. Price the design again to order it.`,
        { quoteId: 'Price your design again before ordering' },
      );
    }
    const payments = await listPayments(db, order.id);
    if (!isPaymentNeeded(order, payments, deps.now()))
      return ok({ number: order.number, checkoutUrl: orderPageUrl(deps.appOrigin, order.number) });
    const pending = payments.findLast((payment) => payment.status === 'pending');
    const paymentId = pending?.id ?? (await insertPendingPayment(db, order, deps.now()));
    const description = (await readOrderDescription(db, order.id)) ?? order.number;
    const checkoutUrl = await paymentPageOrOrderPage(
      { ...order, description, customerEmail: customer.email },
      paymentId,
    );
    return ok({ number: order.number, checkoutUrl });
  }

  /**
   * After the order is committed the customer is always told about it: when the payment page cannot be opened now
   * (the provider or the database is away), the answer is still 201 and leads to the order's page, which offers to
   * pay; the same checkout sent again opens the page for the same attempt.
   */
  async function paymentPageOrOrderPage(order: PayingOrder, paymentId: number): Promise<string> {
    try {
      return await startPayment(order, paymentId);
    } catch (error) {
      deps.log(
        `Order ${order.number}: the payment page did not open (${(error as Error).message}); it opens on retry.`,
      );
      return orderPageUrl(deps.appOrigin, order.number);
    }
  }

  /** Prices the quote again (with rush when the date needs it) and answers with the change for the customer to confirm. */
  async function repriced(
    quote: StoredQuote,
    why: { needsRush: boolean; hasExpired: boolean; dates: Awaited<ReturnType<StoredQuoteService['readyDatesToday']>> },
  ): Promise<Result<never>> {
    const fresh = await deps.storedQuotes.reprice(quote, why.needsRush ? { isRush: true } : {});
    if (!fresh.ok) return fresh;
    const was = formatMoneyText(quote.totalCents, quote.currency);
    const now = formatMoneyText(fresh.value.totalCents, fresh.value.currency);
    const reason = why.needsRush ? 'rush-needed' : 'quote-expired';
    const message = why.needsRush
      ? `To be ready by then this order needs a rush (we normally need until ${why.dates.earliestReadyDate}). With rush the total is ${now} instead of ${was}. Confirm to go on.`
      : `Your price was only held for a while and has been worked out again with today's prices: ${now} instead of ${was}. Confirm to go on.`;
    return failure('conflict', message, undefined, {
      reason,
      quoteId: fresh.value.id,
      previousTotalCents: quote.totalCents,
      totalCents: fresh.value.totalCents,
      currency: fresh.value.currency,
      isRush: fresh.value.isRush,
      ...why.dates,
    });
  }

  /**
   * Opens the hosted payment page for one pending payment row (holding the card, keeping it for later, or charging
   * an approved order at once) and keeps the session's id, its page and the provider's customer on the row.
   */
  async function startPayment(order: PayingOrder, paymentId: number): Promise<string> {
    try {
      const { method } = await chooseCheckoutMethod(db, order, deps.now(), deps.holdWindowDays);
      const providerCustomerId = await providerCustomerFor(
        deps.stripe,
        order,
        await findProviderCustomer(db, order.id),
      );
      const session = await openCheckoutSession(deps.stripe, deps.appOrigin, order, {
        id: paymentId,
        method,
        providerCustomerId,
      });
      await updatePayment(
        db,
        paymentId,
        {
          checkout_session_id: session.id,
          method,
          provider_customer_id: providerCustomerId,
          payment_page_url: session.url,
        },
        deps.now(),
      );
      return session.url;
    } catch (error) {
      // The order stays awaiting payment, and its page offers to try again. Marking the attempt is best effort: a
      // row left pending is opened again, under the same key, by the next request.
      await updatePayment(db, paymentId, { status: 'failed' }, deps.now()).catch(() => undefined);
      throw error;
    }
  }

  /** A new payment page for an order whose card was declined, whose checkout was left, or whose hold lapsed. */
  async function openPayment(customer: CurrentUser, number: string): Promise<Result<CheckoutStartedResponse>> {
    const order = await findCustomerOrder(db, customer.id, number);
    if (!order) return failure('not-found', `There is no order ${number}.`);
    if (!isPaymentNeeded(order, await listPayments(db, order.id), deps.now())) {
      return failure(
        'conflict',
        order.status === 'cancelled'
          ? 'This order is cancelled.'
          : 'Your card is already held for this order; there is nothing to pay now.',
      );
    }
    // A payment link the customer was e-mailed is the same attempt: its page opens again.
    const payments = await listPayments(db, order.id);
    const waiting = payments.findLast((p) => p.status === 'pending' && p.paymentPageUrl !== null);
    if (waiting?.paymentPageUrl && waiting.method === 'payment_link' && order.status === 'proof_approved')
      return ok({ number: order.number, checkoutUrl: waiting.paymentPageUrl });
    const paymentId = await insertPendingPayment(db, order, deps.now());
    const description = (await readOrderDescription(db, order.id)) ?? order.number;
    const checkoutUrl = await startPayment({ ...order, description, customerEmail: customer.email }, paymentId);
    return ok({ number: order.number, checkoutUrl });
  }

  /** Cancels the customer's order before anything is charged, releasing any hold on the card. */
  async function cancel(customer: CurrentUser, number: string): Promise<Result<{ number: string }>> {
    const order = await findCustomerOrder(db, customer.id, number);
    if (!order) return failure('not-found', `There is no order ${number}.`);
    const now = deps.now();
    const shop = await shopScheduleOf(db);
    const moved = await db.transaction(async (trx) => {
      const move = await moveOrder(trx, {
        orderId: order.id,
        action: 'cancel',
        actor: 'customer',
        actorUserId: customer.id,
        note: 'Cancelled by the customer.',
        now,
      });
      if (!move.ok) return move;
      const payments = await listPayments(trx, order.id);
      // A card only kept for later holds nothing: it is simply not charged.
      for (const kept of payments.filter((p) => p.status === 'saved'))
        await updatePayment(trx, kept.id, { status: 'voided' }, now);
      const held = payments.filter((p) => p.status === 'authorized' && p.paymentIntentId);
      for (const payment of held) {
        await releaseHold(deps.stripe, payment.paymentIntentId!);
        await updatePayment(trx, payment.id, { status: 'voided' }, now);
        await insertOrderNote(trx, {
          orderId: order.id,
          type: 'payment_voided',
          actorUserId: null,
          payload: { paymentIntentId: payment.paymentIntentId },
          at: now,
        });
      }
      await syncOrderPaymentStatus(trx, order.id, now);
      // The customer's message is queued with the cancellation, in this transaction.
      const mail = orderCancelledMail(
        { appOrigin: deps.appOrigin, shopName: shop.name, number, orderId: order.id },
        customer.email,
        held.length > 0,
      );
      return ok(await queueLoggedMail(trx, mail, now));
    });
    if (!moved.ok) return moved;
    await sendQueuedMail(mailDeps, moved.value);
    return ok({ number });
  }

  return { place, openPayment, cancel };
}

/** The order as the payment page needs it: its figures, its status (which decides how the card is taken). */
type PayingOrder = Parameters<typeof openCheckoutSession>[2] & { status: OrderStatus };

/** Cancels a held PaymentIntent; one the provider already let go of (lapsed, cancelled) needs nothing more. */
async function releaseHold(stripe: Stripe, paymentIntentId: string): Promise<void> {
  try {
    await stripe.paymentIntents.cancel(paymentIntentId, { cancellation_reason: 'requested_by_customer' });
  } catch (error) {
    const intent = await stripe.paymentIntents.retrieve(paymentIntentId).catch(() => undefined);
    if (intent?.status === 'canceled') return;
    throw error;
  }
}

export type CheckoutService = ReturnType<typeof createCheckoutService>;
