/** The API version the pinned `stripe` SDK sends and expects on events. */
export const STRIPE_API_VERSION = '2026-10-28.endive';

export type Metadata = Record<string, string>;
export type CaptureMethod = 'automatic' | 'automatic_async' | 'manual';

export interface CheckoutSession {
  id: string;
  object: 'checkout.session';
  amount_subtotal: number;
  amount_total: number;
  cancel_url: string | null;
  client_reference_id: string | null;
  created: number;
  currency: string;
  customer: string | null;
  customer_email: string | null;
  expires_at: number;
  livemode: false;
  metadata: Metadata;
  mode: 'payment' | 'setup';
  payment_intent: string | null;
  setup_intent: string | null;
  payment_status: 'paid' | 'unpaid' | 'no_payment_required';
  status: 'open' | 'complete';
  success_url: string;
  url: string | null;
}

export interface CheckoutLineItem {
  name: string;
  unitAmount: number;
  quantity: number;
}

/** A session plus what the hosted page and the payment need but the public object does not show. */
export interface CheckoutSessionRecord {
  session: CheckoutSession;
  lineItems: CheckoutLineItem[];
  paymentIntentData: {
    captureMethod: CaptureMethod;
    metadata: Metadata;
    description: string | null;
    setupFutureUsage: 'off_session' | 'on_session' | null;
  };
  /** Setup mode: the SetupIntent's metadata. */
  setupIntentMetadata: Metadata;
}

export interface Customer {
  id: string;
  object: 'customer';
  created: number;
  email: string | null;
  livemode: false;
  metadata: Metadata;
}

export interface PaymentMethod {
  id: string;
  object: 'payment_method';
  billing_details: { name: string };
  card: { brand: string; last4: string; exp_month: number; exp_year: number };
  created: number;
  customer: string | null;
  livemode: false;
  type: 'card';
}

export interface SetupIntent {
  id: string;
  object: 'setup_intent';
  created: number;
  customer: string | null;
  livemode: false;
  metadata: Metadata;
  payment_method: string;
  status: 'succeeded';
  usage: 'off_session' | 'on_session';
}

export interface PaymentIntent {
  id: string;
  object: 'payment_intent';
  amount: number;
  amount_capturable: number;
  amount_received: number;
  canceled_at: number | null;
  cancellation_reason: string | null;
  capture_method: CaptureMethod;
  created: number;
  currency: string;
  customer: string | null;
  description: string | null;
  last_payment_error: { type: 'card_error'; code: string; decline_code?: string; message: string } | null;
  latest_charge: string | null;
  livemode: false;
  metadata: Metadata;
  payment_method: string | null;
  payment_method_types: ['card'];
  setup_future_usage: 'off_session' | 'on_session' | null;
  status: 'requires_capture' | 'succeeded' | 'canceled' | 'requires_payment_method';
}

export interface Charge {
  id: string;
  object: 'charge';
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  billing_details: { name: string };
  captured: boolean;
  created: number;
  currency: string;
  livemode: false;
  metadata: Metadata;
  paid: true;
  payment_intent: string;
  payment_method_details: {
    type: 'card';
    card: { brand: string; last4: string; exp_month: number; exp_year: number; capture_before: number | null };
  };
  refunded: boolean;
  status: 'succeeded';
}

export interface Refund {
  id: string;
  object: 'refund';
  amount: number;
  charge: string;
  created: number;
  currency: string;
  metadata: Metadata;
  payment_intent: string;
  reason: string | null;
  status: 'succeeded';
}

export interface StripeEvent {
  id: string;
  object: 'event';
  api_version: typeof STRIPE_API_VERSION;
  created: number;
  data: { object: unknown };
  livemode: false;
  pending_webhooks: number;
  request: { id: null; idempotency_key: null };
  type: string;
}

export interface WebhookDelivery {
  eventId: string;
  type: string;
  status: 'pending' | 'delivered' | 'failed';
  /** HTTP status of the last attempt; null when no response came back. */
  statusCode: number | null;
  attempts: number;
  lastError: string | null;
}

/** A stored answer to a POST sent with an `Idempotency-Key`. */
export interface IdempotentResponse {
  path: string;
  paramsFingerprint: string;
  statusCode: number;
  body: string;
}

/** Everything the fake knows, in memory, for tests to read (also served as JSON at `GET /_fake/state`). */
export interface FakeStripeState {
  checkoutSessions: Map<string, CheckoutSessionRecord>;
  customers: Map<string, Customer>;
  paymentMethods: Map<string, PaymentMethod>;
  /** Saved cards whose bank asks for the customer on every payment (the off-session authentication test card). */
  cardsNeedingAuthentication: Set<string>;
  setupIntents: Map<string, SetupIntent>;
  paymentIntents: Map<string, PaymentIntent>;
  charges: Map<string, Charge>;
  refunds: Map<string, Refund>;
  events: StripeEvent[];
  deliveries: WebhookDelivery[];
  idempotentResponses: Map<string, IdempotentResponse>;
}

export function createFakeStripeState(): FakeStripeState {
  return {
    checkoutSessions: new Map(),
    customers: new Map(),
    paymentMethods: new Map(),
    cardsNeedingAuthentication: new Set(),
    setupIntents: new Map(),
    paymentIntents: new Map(),
    charges: new Map(),
    refunds: new Map(),
    events: [],
    deliveries: [],
    idempotentResponses: new Map(),
  };
}

export function snapshotFakeStripeState(state: FakeStripeState) {
  return {
    checkoutSessions: Object.fromEntries(state.checkoutSessions),
    customers: Object.fromEntries(state.customers),
    paymentMethods: Object.fromEntries(state.paymentMethods),
    cardsNeedingAuthentication: [...state.cardsNeedingAuthentication],
    setupIntents: Object.fromEntries(state.setupIntents),
    paymentIntents: Object.fromEntries(state.paymentIntents),
    charges: Object.fromEntries(state.charges),
    refunds: Object.fromEntries(state.refunds),
    events: state.events,
    deliveries: state.deliveries,
    idempotentResponses: Object.fromEntries(state.idempotentResponses),
  };
}
