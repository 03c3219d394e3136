import type Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startStripeFake } from '../../../fakes/stripe/server.ts';
import {
  API_KEY,
  FIXED_NOW_MS,
  WEBHOOK_SECRET,
  orderSeven,
  stripeClientFor,
  submitPaymentForm,
} from './stripe-fake-helpers.ts';

// Stripe test card numbers and form rules: docs.stripe.com/testing (via ../shared/reference/trade-facts.md):
// 4242 4242 4242 4242 succeeds, 4000 0000 0000 0002 is a generic decline, 4000 0000 0000 9995 insufficient funds;
// any future expiry, any three-digit CVC.
let fake: Awaited<ReturnType<typeof startStripeFake>>;
let stripe: Stripe;

beforeAll(async () => {
  // No webhookUrl: events are only recorded, which is all this file needs.
  fake = await startStripeFake({ port: 0, apiKey: API_KEY, webhookSecret: WEBHOOK_SECRET, now: () => FIXED_NOW_MS });
  stripe = stripeClientFor(fake.url);
});
afterAll(() => fake.close());

async function openSession(params: Stripe.Checkout.SessionCreateParams = orderSeven) {
  return stripe.checkout.sessions.create(params);
}

describe('GET /pay/:sessionId', () => {
  it('when the session is open, then the page shows the order, the card form and a way back', async () => {
    const session = await openSession();
    const response = await fetch(session.url!);
    const page = await response.text();
    expect(response.status).toBe(200);
    expect(response.headers.get('content-security-policy')).toMatch(/^default-src 'none'; style-src 'sha256-/);
    expect(page).toContain('Monogram, 3 letters × 1');
    expect(page).toContain('Pay $64.00');
    for (const label of ['Card number', 'Expiry (MM/YY)', 'CVC', 'Name on card'])
      expect(page).toContain(`>${label}</label>`);
    expect(page).toContain('href="http://127.0.0.1:3999/checkout/cancelled"');
    expect(page).not.toMatch(/(src|href)="https?:\/\/(?!127\.0\.0\.1:3999)/);
  });

  it('when a product name carries markup, then the page shows it escaped', async () => {
    const session = await openSession({
      ...orderSeven,
      line_items: [
        {
          price_data: { currency: 'jpy', unit_amount: 500, product_data: { name: '<img src=x onerror=alert(1)>' } },
          quantity: 1,
        },
      ],
    });
    const page = await (await fetch(session.url!)).text();
    expect(page).not.toContain('<img');
    expect(page).toContain('&lt;img src=x onerror=alert(1)&gt;');
    // Zero-decimal currency: JPY 500 is ¥500 (docs.stripe.com/currencies, via trade-facts).
    expect(page).toContain('¥500');
  });

  it('when the session is unknown, then it answers 404', async () => {
    expect((await fetch(`${fake.url}/pay/cs_test_999999`)).status).toBe(404);
  });
});

describe('POST /pay/:sessionId', () => {
  it.each([
    ['4000 0000 0000 0002', 'Your card was declined.'],
    ['4000 0000 0000 9995', 'Your card has insufficient funds.'],
    ['5555 5555 5555 4444', 'This local page takes test cards only.'],
  ])('when the card is %s, then the page comes back with "%s" and nothing is charged', async (cardNumber, message) => {
    const session = await openSession();
    const response = await submitPaymentForm(session.url!, { card_number: cardNumber });
    expect(response.status).toBe(402);
    const page = await response.text();
    expect(page).toMatch(/<p class="alert" role="alert">Your card [^<]+<\/p>/);
    expect(page).toContain(message);
    expect(page).toContain(`value="${cardNumber}"`);
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
    expect(fake.state.paymentIntents.size).toBe(0);
    // As Stripe does, the decline is announced on the session's intent, with the session's metadata.
    expect(fake.state.events.at(-1)).toMatchObject({
      type: 'payment_intent.payment_failed',
      data: {
        object: {
          status: 'requires_payment_method',
          last_payment_error: { code: 'card_declined', message: expect.stringContaining(message) },
        },
      },
    });
  });

  it.each([
    ['a number failing Luhn', { card_number: '4242 4242 4242 4241' }, 'card_number', 'Your card number is invalid.'],
    ['letters in the number', { card_number: '4242 abcd' }, 'card_number', 'Your card number is invalid.'],
    ['a short number', { card_number: '4242 42' }, 'card_number', 'Your card number is incomplete.'],
    ['an expiry in the past', { expiry: '11/26' }, 'expiry', "Your card's expiration date is in the past."],
    ['a malformed expiry', { expiry: '13/30' }, 'expiry', "Enter your card's expiry date as MM/YY."],
    ['a short CVC', { cvc: '12' }, 'cvc', "Your card's security code is incomplete."],
    ['no name', { name: '  ' }, 'name', 'Enter the name on the card.'],
  ])('when the form has %s, then the message appears under that field', async (_case, fields, fieldId, message) => {
    const session = await openSession();
    const response = await submitPaymentForm(session.url!, fields);
    const page = await response.text();
    expect(response.status).toBe(400);
    expect(page).toContain(`id="${fieldId}"`);
    expect(page).toMatch(new RegExp(`aria-describedby="${fieldId}-error"`));
    expect(page).toContain(`<p class="field-error" id="${fieldId}-error">${message.replace("'", '&#39;')}</p>`);
  });

  it('when the card expires this very month, then it is still accepted', async () => {
    const session = await openSession();
    expect((await submitPaymentForm(session.url!, { expiry: '12/26', card_number: '4242424242424242' })).status).toBe(
      303,
    );
  });

  it('when a paid session is submitted again, then nothing more is charged', async () => {
    const session = await openSession();
    await submitPaymentForm(session.url!);
    const intents = fake.state.paymentIntents.size;
    const again = await submitPaymentForm(`${fake.url}/pay/${session.id}`);
    expect(again.status).toBe(409);
    expect(await again.text()).toContain('This payment is complete');
    expect(fake.state.paymentIntents.size).toBe(intents);
  });
});
