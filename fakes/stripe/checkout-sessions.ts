import { Router } from 'express';
import { z } from 'zod';
import { resourceMissing } from './api-error.ts';
import type { FakeStripeContext } from './fake-stripe-context.ts';
import type { CheckoutSession, CheckoutSessionRecord } from './fake-stripe-state.ts';
import {
  currency,
  expand,
  expandFields,
  formInteger,
  httpUrl,
  metadata,
  parseParams,
  positiveAmount,
} from './form-params.ts';

// Stripe's ceiling for a single card payment in two-decimal currencies (999,999.99).
const MAX_AMOUNT = 99_999_999;
const SESSION_LIFETIME_SECONDS = 24 * 60 * 60;

const lineItemSchema = z.object({
  price_data: z.object({
    currency,
    unit_amount: formInteger.pipe(z.number().min(0, 'must be zero or more')),
    product_data: z.object({ name: z.string().min(1).max(250) }),
  }),
  quantity: positiveAmount,
});

const createSessionSchema = z
  .object({
    mode: z.enum(['payment', 'setup'], { error: 'this fake supports mode=payment and mode=setup only' }),
    line_items: z.array(lineItemSchema).min(1).max(100).optional(),
    // Setup mode names the currency of the payments the saved card will make.
    currency: currency.optional(),
    customer: z.string().startsWith('cus_', 'Invalid customer id').optional(),
    success_url: httpUrl,
    cancel_url: httpUrl.optional(),
    client_reference_id: z.string().max(200).optional(),
    customer_email: z.email().optional(),
    metadata: metadata.optional(),
    payment_intent_data: z
      .object({
        capture_method: z.enum(['automatic', 'automatic_async', 'manual']).optional(),
        setup_future_usage: z.enum(['off_session', 'on_session']).optional(),
        description: z.string().max(1000).optional(),
        metadata: metadata.optional(),
      })
      .optional(),
    setup_intent_data: z.object({ metadata: metadata.optional() }).optional(),
    expand,
  })
  .superRefine((params, issues) => {
    if (params.mode === 'setup') {
      if (params.line_items)
        issues.addIssue({ code: 'custom', path: ['line_items'], message: 'not allowed in setup mode' });
      if (!params.currency) issues.addIssue({ code: 'custom', path: ['currency'], message: 'required in setup mode' });
      return;
    }
    if (!params.line_items) {
      issues.addIssue({ code: 'custom', path: ['line_items'], message: 'required in payment mode' });
      return;
    }
    const first = params.line_items[0].price_data.currency;
    params.line_items.forEach((item, index) => {
      if (item.price_data.currency !== first) {
        issues.addIssue({
          code: 'custom',
          path: ['line_items', index, 'price_data', 'currency'],
          message: 'all line items must use the same currency',
        });
      }
    });
    const total = params.line_items.reduce((sum, item) => sum + item.price_data.unit_amount * item.quantity, 0);
    if (total > MAX_AMOUNT) {
      issues.addIssue({ code: 'custom', path: ['line_items'], message: `the total must be at most ${MAX_AMOUNT}` });
    }
  });

const retrieveSchema = z.object({ expand });

/** `POST /v1/checkout/sessions` and `GET /v1/checkout/sessions/:id` for hosted, one-off card payments. */
export function createCheckoutSessionsRouter(ctx: FakeStripeContext): Router {
  const router = Router();

  const present = (session: CheckoutSession, fields: string[] | undefined) =>
    expandFields(session, fields, {
      payment_intent: (s) => (s.payment_intent ? (ctx.state.paymentIntents.get(s.payment_intent) ?? null) : null),
      setup_intent: (s) => (s.setup_intent ? (ctx.state.setupIntents.get(s.setup_intent) ?? null) : null),
    });

  router.post('/', (req, res) => {
    const params = parseParams(createSessionSchema, req.body);
    const id = ctx.nextId('cs');
    const created = ctx.nowSeconds();
    if (params.customer && !ctx.state.customers.has(params.customer))
      throw resourceMissing('customer', params.customer);
    const lineItems = (params.line_items ?? []).map((item) => ({
      name: item.price_data.product_data.name,
      unitAmount: item.price_data.unit_amount,
      quantity: item.quantity,
    }));
    const amountTotal = lineItems.reduce((sum, item) => sum + item.unitAmount * item.quantity, 0);
    const record: CheckoutSessionRecord = {
      session: {
        id,
        object: 'checkout.session',
        amount_subtotal: amountTotal,
        amount_total: amountTotal,
        cancel_url: params.cancel_url ?? null,
        client_reference_id: params.client_reference_id ?? null,
        created,
        currency: params.currency ?? params.line_items![0].price_data.currency,
        customer: params.customer ?? null,
        customer_email: params.customer_email ?? null,
        expires_at: created + SESSION_LIFETIME_SECONDS,
        livemode: false,
        metadata: params.metadata ?? {},
        mode: params.mode,
        payment_intent: null,
        setup_intent: null,
        payment_status: 'unpaid',
        status: 'open',
        success_url: params.success_url,
        url: ctx.paymentPageUrl(id),
      },
      lineItems,
      paymentIntentData: {
        captureMethod: params.payment_intent_data?.capture_method ?? 'automatic',
        metadata: params.payment_intent_data?.metadata ?? {},
        description: params.payment_intent_data?.description ?? null,
        setupFutureUsage: params.payment_intent_data?.setup_future_usage ?? null,
      },
      setupIntentMetadata: params.setup_intent_data?.metadata ?? {},
    };
    ctx.state.checkoutSessions.set(id, record);
    res.json(present(record.session, params.expand));
  });

  router.get('/:id', (req, res) => {
    const record = ctx.state.checkoutSessions.get(req.params.id);
    if (!record) throw resourceMissing('checkout.session', req.params.id);
    res.json(present(record.session, parseParams(retrieveSchema, req.query).expand));
  });

  return router;
}
