import { expect, test } from '@playwright/test';
import Stripe from 'stripe';
import { loadDatabaseConfig } from '../../server/src/config.ts';
import { openDatabase } from '../../server/src/db/knex.ts';
import { signInAs } from './support/sign-in.ts';

// Stripe's test card that asks for authentication on every payment, however it was saved (Stripe's testing docs,
// 4000 0027 6000 3184, from memory): the studio's off-session charge of it needs the customer.
const AUTHENTICATE_ALWAYS = '4000 0027 6000 3184';

/** The official SDK against the test stack's Stripe stand-in. */
function stackStripe(): Stripe {
  const api = new URL(process.env.STRIPE_API_URL!);
  return new Stripe(process.env.STRIPE_SECRET_KEY!, {
    host: api.hostname,
    port: Number(api.port),
    protocol: 'http',
    maxNetworkRetries: 0,
  });
}

/** Keeps the always-authenticate card for WB-1006 (approved, used by no other journey) as checkout's setup mode would. */
async function keepCardNeedingTheCustomer(): Promise<string> {
  const stripe = stackStripe();
  const db = openDatabase(loadDatabaseConfig());
  try {
    const order = await db('orders as o')
      .join('users as u', 'u.id', 'o.customer_id')
      .where('o.number', 'WB-1006')
      .first('o.id', 'u.name', 'u.email');
    const customer = await stripe.customers.create({ email: order.email });
    const session = await stripe.checkout.sessions.create({
      mode: 'setup',
      currency: 'usd',
      customer: customer.id,
      success_url: 'http://127.0.0.1/done',
    });
    const form = new URLSearchParams({
      card_number: AUTHENTICATE_ALWAYS,
      expiry: '12/30',
      cvc: '123',
      name: order.name,
    });
    await fetch(session.url!, { method: 'POST', body: form, redirect: 'manual' });
    const setup = await stripe.setupIntents.retrieve(
      (await stripe.checkout.sessions.retrieve(session.id)).setup_intent as string,
    );
    await db('payments')
      .where({ order_id: order.id })
      .update({
        status: 'saved',
        method: 'saved_card',
        payment_intent_id: null,
        amount_authorized_cents: 0,
        capture_before: null,
        provider_customer_id: customer.id,
        payment_method_id: setup.payment_method as string,
      });
    await db('orders').where({ id: order.id }).update({ payment_status: 'saved' });
    return order.name;
  } finally {
    await db.destroy();
  }
}

test('when the bank wants the customer for the studio’s charge, then she pays on the link from her order page and the order goes into production', async ({
  page,
  browser,
}) => {
  const customerName = await keepCardNeedingTheCustomer();

  const studio = await (await browser.newContext()).newPage();
  await studio.goto('/admin/orders/WB-1006');
  await signInAs(studio, 'Tobias Fenwick', /sign in with google/i);
  await expect(studio.getByText(/The card is saved, not held/)).toBeVisible();
  await studio.getByRole('button', { name: /Approve & charge/ }).click();
  await studio.getByRole('button', { name: 'Charge the card' }).click();
  await expect(studio.getByRole('alert')).toContainText('bank wants them to confirm this payment');

  await page.goto('/orders/WB-1006');
  await signInAs(page, customerName.split(' ')[0]);
  const payment = page.getByRole('region', { name: 'Payment' });
  await expect(payment).toContainText('Your bank asked for you to confirm this payment yourself');
  await payment.getByRole('link', { name: /Confirm and pay/ }).click();

  await expect(page.getByRole('heading', { name: /^Pay \$/ })).toBeVisible();
  await page.getByLabel('Card number').fill(AUTHENTICATE_ALWAYS);
  await page.getByLabel('Expiry (MM/YY)').fill('12/30');
  await page.getByLabel('CVC').fill('123');
  await page.getByLabel('Name on card').fill(customerName);
  await page.getByRole('button', { name: /^Pay \$/ }).click();

  await expect(page).toHaveURL(/\/orders\/WB-1006/);
  await expect(async () => {
    await page.reload();
    await expect(page.getByRole('region', { name: 'Payment' })).toContainText('charged', { timeout: 1000 });
  }).toPass({ timeout: 15_000 });
  await expect(page.getByRole('region', { name: 'Payment' })).not.toContainText('Confirm and pay');
});
