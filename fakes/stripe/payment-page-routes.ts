import express, { Router } from 'express';
import { z } from 'zod';
import { completeCheckout } from './complete-checkout.ts';
import type { FakeStripeContext } from './fake-stripe-context.ts';
import type { CheckoutSessionRecord } from './fake-stripe-state.ts';
import { sendPaymentCompletePage, sendPaymentMissingPage, sendPaymentPage } from './payment-page.ts';
import { checkTestCard } from './test-cards.ts';

const typed = z.string().max(200).catch('');
const cardFormSchema = z.object({ card_number: typed, expiry: typed, cvc: typed, name: typed });

/**
 * Stripe reports a declined attempt on the session's PaymentIntent with `payment_intent.payment_failed`; the session
 * stays open for another card. This fake creates PaymentIntents only for accepted cards, so the event carries a
 * stand-in intent (its own id series, so the ids of real intents do not shift) with the session's metadata.
 */
function announceDecline(ctx: FakeStripeContext, record: CheckoutSessionRecord, message: string): void {
  if (record.session.mode === 'setup') {
    // Setup mode reports a declined card on the session's SetupIntent instead.
    ctx.emit('setup_intent.setup_failed', {
      id: ctx.nextId('seti'),
      object: 'setup_intent',
      customer: record.session.customer,
      metadata: { ...record.setupIntentMetadata },
      status: 'requires_payment_method',
      last_setup_error: { type: 'card_error', code: 'card_declined', message },
    });
    return;
  }
  ctx.emit('payment_intent.payment_failed', {
    id: ctx.nextId('pi'),
    object: 'payment_intent',
    amount: record.session.amount_total,
    currency: record.session.currency,
    capture_method: record.paymentIntentData.captureMethod,
    metadata: { ...record.paymentIntentData.metadata },
    status: 'requires_payment_method',
    last_payment_error: { type: 'card_error', code: 'card_declined', message },
  });
}

/** The hosted payment page behind each Checkout Session's `url`. */
export function createPaymentPageRouter(ctx: FakeStripeContext): Router {
  const router = Router();
  router.use(express.urlencoded({ extended: false, limit: '16kb' }));

  router.get('/:sessionId', (req, res) => {
    const record = ctx.state.checkoutSessions.get(req.params.sessionId);
    if (!record) return sendPaymentMissingPage(res, req.params.sessionId);
    if (record.session.status !== 'open') return sendPaymentCompletePage(res, record);
    sendPaymentPage(res, { record });
  });

  router.post('/:sessionId', (req, res) => {
    const record = ctx.state.checkoutSessions.get(req.params.sessionId);
    if (!record) return sendPaymentMissingPage(res, req.params.sessionId);
    if (record.session.status !== 'open') return sendPaymentCompletePage(res, record);
    const form = cardFormSchema.parse(req.body ?? {});
    const check = checkTestCard(form, ctx.nowMs());
    if (!check.ok) {
      if (check.decline) announceDecline(ctx, record, check.decline);
      sendPaymentPage(
        res,
        { record, form, fieldErrors: check.fieldErrors, decline: check.decline },
        check.decline ? 402 : 400,
      );
      return;
    }
    completeCheckout(ctx, record, check.card);
    // 303 so the browser follows with a GET, as after any form post.
    res.redirect(303, record.session.success_url.replaceAll('{CHECKOUT_SESSION_ID}', record.session.id));
  });

  return router;
}
