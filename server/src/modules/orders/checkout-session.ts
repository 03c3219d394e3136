import type Stripe from 'stripe';
import { orderPageUrl } from '../mail/mail-layout.ts';

export interface CheckoutSessionOrder {
  id: number;
  number: string;
  totalCents: number;
  currency: string;
  description: string;
  customerEmail: string;
}

/**
 * What the hosted page does: `hold` holds the total (manual capture) and keeps the card for a later charge;
 * `saved_card` only keeps the card (setup mode), for orders due after a hold would have ended; `payment_link`
 * charges the total at once, for an approved order whose bank wanted the customer to confirm the payment.
 */
export type CheckoutMethod = 'hold' | 'saved_card' | 'payment_link';

/** The order's customer at the provider, made once per order (the key makes a retry find the same one). */
export async function providerCustomerFor(
  stripe: Stripe,
  order: Pick<CheckoutSessionOrder, 'id' | 'number' | 'customerEmail'>,
  known: string | null,
): Promise<string> {
  if (known) return known;
  const customer = await stripe.customers.create(
    { email: order.customerEmail, metadata: { orderNumber: order.number } },
    { idempotencyKey: `hoopwright-customer-order-${order.id}` },
  );
  return customer.id;
}

/**
 * Opens the payment provider's hosted checkout for the order (see `CheckoutMethod`). Both return addresses lead
 * back to the order's page, which waits there for the webhook. The payment row's id keys the request, so a retried
 * call cannot open two sessions for one attempt.
 */
export async function openCheckoutSession(
  stripe: Stripe,
  appOrigin: string,
  order: CheckoutSessionOrder,
  payment: { id: number; method: CheckoutMethod; providerCustomerId: string },
): Promise<{ id: string; url: string }> {
  const metadata = { orderId: String(order.id), orderNumber: order.number, paymentId: String(payment.id) };
  const orderPage = orderPageUrl(appOrigin, order.number);
  const common = {
    success_url: `${orderPage}?checkout=done`,
    cancel_url: `${orderPage}?checkout=cancelled`,
    client_reference_id: order.number,
    customer: payment.providerCustomerId,
    metadata,
  };
  const params: Stripe.Checkout.SessionCreateParams =
    payment.method === 'saved_card'
      ? {
          ...common,
          mode: 'setup',
          currency: order.currency.toLowerCase(),
          setup_intent_data: { metadata, description: `Order ${order.number}` },
        }
      : {
          ...common,
          mode: 'payment',
          line_items: [
            {
              // One line for the whole order: the total already holds tax, and the quote's lines stay the record.
              price_data: {
                currency: order.currency.toLowerCase(),
                unit_amount: order.totalCents,
                product_data: { name: `Order ${order.number}: ${order.description}`.slice(0, 250) },
              },
              quantity: 1,
            },
          ],
          payment_intent_data: {
            capture_method: payment.method === 'hold' ? 'manual' : 'automatic',
            // Kept for a later charge: a total that grows with a new proof, or a hold that lapses.
            setup_future_usage: 'off_session',
            metadata,
            description: `Order ${order.number}`,
          },
        };
  const session = await stripe.checkout.sessions.create(params, {
    idempotencyKey: `hoopwright-payment-${payment.id}`,
  });
  if (!session.url) throw new Error(`Checkout session ${session.id} came back without a payment page.`);
  return { id: session.id, url: session.url };
}
