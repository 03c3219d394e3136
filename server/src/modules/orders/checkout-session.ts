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
 * Opens the payment provider's hosted checkout for the whole order total. The card is only held
 * (`capture_method: manual`): the studio charges it once the customer approves the proof. Both return addresses
 * lead back to the order's page, which waits there for the webhook. The payment row's id keys the request, so a
 * retried call cannot open two sessions for one attempt.
 */
export async function openCheckoutSession(
  stripe: Stripe,
  appOrigin: string,
  order: CheckoutSessionOrder,
  paymentId: number,
): Promise<{ id: string; url: string }> {
  const metadata = { orderId: String(order.id), orderNumber: order.number, paymentId: String(paymentId) };
  const orderPage = orderPageUrl(appOrigin, order.number);
  const session = await stripe.checkout.sessions.create(
    {
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
      success_url: `${orderPage}?checkout=done`,
      cancel_url: `${orderPage}?checkout=cancelled`,
      client_reference_id: order.number,
      customer_email: order.customerEmail,
      metadata,
      payment_intent_data: { capture_method: 'manual', metadata, description: `Order ${order.number}` },
    },
    { idempotencyKey: `hoopwright-payment-${paymentId}` },
  );
  if (!session.url) throw new Error(`Checkout session ${session.id} came back without a payment page.`);
  return { id: session.id, url: session.url };
}
