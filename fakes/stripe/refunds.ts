import { Router } from 'express';
import { z } from 'zod';
import { invalidRequest, resourceMissing } from './api-error.ts';
import type { FakeStripeContext } from './fake-stripe-context.ts';
import type { Charge, Refund } from './fake-stripe-state.ts';
import { metadata, parseParams, positiveAmount } from './form-params.ts';

const createRefundSchema = z.object({
  payment_intent: z.string().optional(),
  charge: z.string().optional(),
  amount: positiveAmount.optional(),
  reason: z.enum(['duplicate', 'fraudulent', 'requested_by_customer']).optional(),
  metadata: metadata.optional(),
});

/** `POST /v1/refunds`: full or partial refunds of captured card payments, each settling at once. */
export function createRefundsRouter(ctx: FakeStripeContext): Router {
  const router = Router();

  const chargeToRefund = (params: z.output<typeof createRefundSchema>): Charge => {
    if (params.payment_intent) {
      const intent = ctx.state.paymentIntents.get(params.payment_intent);
      if (!intent) throw resourceMissing('payment_intent', params.payment_intent);
      if (intent.status !== 'succeeded') {
        throw invalidRequest(
          `This PaymentIntent (${intent.id}) has a status of ${intent.status} and holds no captured charge to refund; ` +
            'cancel an uncaptured PaymentIntent instead.',
          { code: 'charge_not_refundable', param: 'payment_intent' },
        );
      }
      return ctx.state.charges.get(intent.latest_charge ?? '') as Charge;
    }
    if (params.charge) {
      const charge = ctx.state.charges.get(params.charge);
      if (!charge) throw resourceMissing('charge', params.charge);
      if (!charge.captured) {
        throw invalidRequest(`Charge ${charge.id} has not been captured.`, {
          code: 'charge_not_refundable',
          param: 'charge',
        });
      }
      return charge;
    }
    throw invalidRequest('One of the following params should be provided for this request: payment_intent or charge.', {
      code: 'parameter_missing',
    });
  };

  router.post('/', (req, res) => {
    const params = parseParams(createRefundSchema, req.body);
    const charge = chargeToRefund(params);
    const refundable = charge.amount_captured - charge.amount_refunded;
    if (refundable === 0) {
      throw invalidRequest(`Charge ${charge.id} has already been refunded.`, { code: 'charge_already_refunded' });
    }
    const amount = params.amount ?? refundable;
    if (amount > refundable) {
      throw invalidRequest(`Refund amount (${amount}) is greater than unrefunded amount on charge (${refundable}).`, {
        code: 'amount_too_large',
        param: 'amount',
      });
    }
    const refund: Refund = {
      id: ctx.nextId('re'),
      object: 'refund',
      amount,
      charge: charge.id,
      created: ctx.nowSeconds(),
      currency: charge.currency,
      metadata: params.metadata ?? {},
      payment_intent: charge.payment_intent,
      reason: params.reason ?? null,
      status: 'succeeded',
    };
    ctx.state.refunds.set(refund.id, refund);
    charge.amount_refunded += amount;
    charge.refunded = charge.amount_refunded === charge.amount_captured;
    ctx.emit('charge.refunded', charge);
    res.json(refund);
  });

  return router;
}
