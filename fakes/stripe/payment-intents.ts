import { Router } from 'express';
import { z } from 'zod';
import { invalidRequest, resourceMissing } from './api-error.ts';
import type { FakeStripeContext } from './fake-stripe-context.ts';
import type { PaymentIntent } from './fake-stripe-state.ts';
import { expand, expandFields, parseParams, positiveAmount } from './form-params.ts';
import { createOffSessionPayment } from './off-session-payments.ts';

const captureSchema = z.object({ amount_to_capture: positiveAmount.optional(), expand });
const cancelSchema = z.object({
  cancellation_reason: z.enum(['duplicate', 'fraudulent', 'requested_by_customer', 'abandoned']).optional(),
  expand,
});

/**
 * Create (an off-session charge of a saved card), retrieve, capture (authorize-then-charge, in full or for
 * `amount_to_capture`) and cancel.
 */
export function createPaymentIntentsRouter(ctx: FakeStripeContext): Router {
  const router = Router();

  const find = (id: string): PaymentIntent => {
    const intent = ctx.state.paymentIntents.get(id);
    if (!intent) throw resourceMissing('payment_intent', id);
    return intent;
  };
  const present = (intent: PaymentIntent, fields: string[] | undefined) =>
    expandFields(intent, fields, {
      latest_charge: (pi) => (pi.latest_charge ? (ctx.state.charges.get(pi.latest_charge) ?? null) : null),
    });
  const refuseUnlessCapturable = (intent: PaymentIntent, action: 'captured' | 'canceled', allowed: string) => {
    if (intent.status !== 'requires_capture') {
      throw invalidRequest(
        `This PaymentIntent could not be ${action} because it has a status of ${intent.status}. ` +
          `Only a PaymentIntent with one of the following statuses may be ${action}: ${allowed}.`,
        { code: 'payment_intent_unexpected_state' },
      );
    }
  };

  router.post('/', (req, res) => {
    const { intent, error } = createOffSessionPayment(ctx, req.body);
    if (error) {
      // A card error carries the PaymentIntent it left behind, so the caller can bring the customer back to it.
      res.status(402).json({ error: { ...error, payment_intent: present(intent, undefined) } });
      return;
    }
    res.json(present(intent, parseParams(z.object({ expand }), { expand: req.body?.expand }).expand));
  });

  router.get('/:id', (req, res) => {
    res.json(present(find(req.params.id), parseParams(z.object({ expand }), req.query).expand));
  });

  router.post('/:id/capture', (req, res) => {
    const intent = find(req.params.id);
    const params = parseParams(captureSchema, req.body);
    refuseUnlessCapturable(intent, 'captured', 'requires_capture');
    const amount = params.amount_to_capture ?? intent.amount_capturable;
    if (amount > intent.amount_capturable) {
      throw invalidRequest(
        `The amount to capture (${amount}) is greater than the amount capturable (${intent.amount_capturable}).`,
        { code: 'amount_too_large', param: 'amount_to_capture' },
      );
    }
    // One capture per authorization: a partial capture releases the rest of the hold.
    Object.assign(intent, { status: 'succeeded', amount_received: amount, amount_capturable: 0 });
    const charge = ctx.state.charges.get(intent.latest_charge ?? '');
    if (charge) Object.assign(charge, { captured: true, amount_captured: amount });
    ctx.emit('payment_intent.succeeded', intent);
    res.json(present(intent, params.expand));
  });

  router.post('/:id/cancel', (req, res) => {
    const intent = find(req.params.id);
    const params = parseParams(cancelSchema, req.body);
    refuseUnlessCapturable(
      intent,
      'canceled',
      'requires_payment_method, requires_capture, requires_confirmation, requires_action, processing',
    );
    Object.assign(intent, {
      status: 'canceled',
      amount_capturable: 0,
      canceled_at: ctx.nowSeconds(),
      cancellation_reason: params.cancellation_reason ?? null,
    });
    ctx.emit('payment_intent.canceled', intent);
    res.json(present(intent, params.expand));
  });

  return router;
}
