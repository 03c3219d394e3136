import { Router } from 'express';
import { z } from 'zod';
import { resourceMissing } from './api-error.ts';
import type { FakeStripeContext } from './fake-stripe-context.ts';
import type { AcceptedCard } from './test-cards.ts';
import { metadata, parseParams } from './form-params.ts';

const createCustomerSchema = z.object({ email: z.email().optional(), metadata: metadata.optional() });

/**
 * Keeps a card on a customer as a PaymentMethod, for payments made later (`setup_future_usage` or a SetupIntent);
 * answers the PaymentMethod's id. The "always authenticate" test card is remembered as one whose bank asks for the
 * customer again on every later charge.
 */
export function saveCard(ctx: FakeStripeContext, card: AcceptedCard, customer: string | null): string {
  const id = ctx.nextId('pm');
  ctx.state.paymentMethods.set(id, {
    id,
    object: 'payment_method',
    billing_details: { name: card.holderName },
    card: { brand: card.brand, last4: card.last4, exp_month: card.expMonth, exp_year: card.expYear },
    created: ctx.nowSeconds(),
    customer,
    livemode: false,
    type: 'card',
  });
  if (card.needsAuthenticationOffSession) ctx.state.cardsNeedingAuthentication.add(id);
  return id;
}

/** `POST /v1/customers`, `GET /v1/customers/:id`, and `GET /v1/payment_methods/:id` for the cards kept on them. */
export function createCustomersRouter(ctx: FakeStripeContext): Router {
  const router = Router();

  router.post('/customers', (req, res) => {
    const params = parseParams(createCustomerSchema, req.body);
    const id = ctx.nextId('cus');
    const customer = {
      id,
      object: 'customer' as const,
      created: ctx.nowSeconds(),
      email: params.email ?? null,
      livemode: false as const,
      metadata: params.metadata ?? {},
    };
    ctx.state.customers.set(id, customer);
    res.json(customer);
  });

  router.get('/customers/:id', (req, res) => {
    const customer = ctx.state.customers.get(req.params.id);
    if (!customer) throw resourceMissing('customer', req.params.id);
    res.json(customer);
  });

  router.get('/payment_methods/:id', (req, res) => {
    const method = ctx.state.paymentMethods.get(req.params.id);
    if (!method) throw resourceMissing('payment_method', req.params.id);
    res.json(method);
  });

  router.get('/setup_intents/:id', (req, res) => {
    const intent = ctx.state.setupIntents.get(req.params.id);
    if (!intent) throw resourceMissing('setup_intent', req.params.id);
    res.json(intent);
  });

  return router;
}
