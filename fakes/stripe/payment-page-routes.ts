import express, { Router } from 'express';
import { z } from 'zod';
import { completeCheckout } from './complete-checkout.ts';
import type { FakeStripeContext } from './fake-stripe-context.ts';
import { sendPaymentCompletePage, sendPaymentMissingPage, sendPaymentPage } from './payment-page.ts';
import { checkTestCard } from './test-cards.ts';

const typed = z.string().max(200).catch('');
const cardFormSchema = z.object({ card_number: typed, expiry: typed, cvc: typed, name: typed });

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
      sendPaymentPage(res, { record, form, fieldErrors: check.fieldErrors, decline: check.decline }, check.decline ? 402 : 400);
      return;
    }
    completeCheckout(ctx, record, check.card);
    // 303 so the browser follows with a GET, as after any form post.
    res.redirect(303, record.session.success_url.replaceAll('{CHECKOUT_SESSION_ID}', record.session.id));
  });

  return router;
}
