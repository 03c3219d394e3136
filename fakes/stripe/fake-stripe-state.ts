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
  customer_email: string | null;
  expires_at: number;
  livemode: false;
  metadata: Metadata;
  mode: 'payment';
  payment_intent: string | null;
  payment_status: 'paid' | 'unpaid';
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
  paymentIntentData: { captureMethod: CaptureMethod; metadata: Metadata; description: string | null };
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
  description: string | null;
  latest_charge: string | null;
  livemode: false;
  metadata: Metadata;
  payment_method_types: ['card'];
  status: 'requires_capture' | 'succeeded' | 'canceled';
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
    paymentIntents: Object.fromEntries(state.paymentIntents),
    charges: Object.fromEntries(state.charges),
    refunds: Object.fromEntries(state.refunds),
    events: state.events,
    deliveries: state.deliveries,
    idempotentResponses: Object.fromEntries(state.idempotentResponses),
  };
}
