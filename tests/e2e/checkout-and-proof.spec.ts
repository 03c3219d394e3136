import { expect, test, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { loadDatabaseConfig } from '../../server/src/config.ts';
import { openDatabase } from '../../server/src/db/knex.ts';
import { proofPicture, sendTestProof } from '../support/proof-fixtures.ts';
import { signInAs } from './support/sign-in.ts';

// Each journey walks the designer, the checkout and the payment page, so it gets more than the usual 30 s.
test.describe.configure({ mode: 'serial', timeout: 90_000 });

const price = (page: Page) => page.getByRole('region', { name: 'Your price' });
const onTheGarment = (page: Page) => page.getByRole('region', { name: 'On the garment' });
const totalOf = async (page: Page) =>
  (await price(page)
    .getByRole('row', { name: /^Total/ })
    .textContent())!;
const screens = (name: string) => `test-results/screens/checkout-${name}.png`;

/** A month ahead: well past the studio's lead time, so the order is not a rush. */
// Thirty days out: past the 7-day hold window, so checkout saves the card for the charge instead of holding it.
const neededBy = new Date(Date.now() + 30 * 86_400_000).toISOString().slice(0, 10);

async function fillAddress(page: Page) {
  await page.getByLabel('Name', { exact: true }).fill('Priya Castellanos');
  await page.getByLabel('Street address').fill('48 Larkspur Lane');
  await page.getByLabel('Town or city').fill('Fernhollow');
  await page.getByLabel('State, county or region').fill('OR');
  await page.getByLabel('Postal code').fill('97000');
}

async function payWith(page: Page, cardNumber: string) {
  await expect(page.getByRole('heading', { name: /^(Pay \$|Save your card)/ })).toBeVisible();
  await page.getByLabel('Card number').fill(cardNumber);
  await page.getByLabel('Expiry (MM/YY)').fill('12/30');
  await page.getByLabel('CVC').fill('123');
  await page.getByLabel('Name on card').fill('Priya Castellanos');
  await page.getByRole('button', { name: /^(Pay \$|Save your card)/ }).click();
}

let orderNumber = '';

test('when Priya designs a bishop dress, orders it and pays with the test card, then the order waits for its proof with the card saved for the charge', async ({
  page,
}) => {
  await page.goto('/design/bishop-dress');
  await page.getByText('Add a border', { exact: true }).click();
  await page.getByRole('radio', { name: /Front only/ }).check({ force: true });
  await page.getByRole('radio', { name: /Daisy and leaf chain/ }).check({ force: true });
  await page.getByRole('button', { name: 'Add this border' }).click();
  await expect(price(page).getByRole('row', { name: /^Total \$\d+\.\d\d$/ })).toBeVisible();
  const frontTotal = await totalOf(page);

  // All the way round the 692 mm hem the border takes 4 repeats instead of 2 (common practice, no source: 4 × 173 mm).
  await onTheGarment(page)
    .getByRole('radio', { name: /All the way round/ })
    .check({ force: true });
  await expect(onTheGarment(page)).toContainText('4 repeats all the way round');
  await expect(price(page).getByRole('row', { name: /^Total/ })).not.toHaveText(frontTotal);
  await page.getByText('Add a name', { exact: true }).click();
  await page.getByRole('textbox', { name: 'Name or words' }).fill('Eliza');
  await page.getByRole('button', { name: 'Add the name' }).click();
  await expect(price(page).getByRole('cell', { name: /^Lettering “Eliza”/ })).toBeVisible();
  const designTotal = await totalOf(page);

  await signInAs(page, 'Priya Castellanos', /sign in to save or order/i);
  await expect(onTheGarment(page).getByRole('listitem')).toHaveCount(2);
  await page.getByRole('textbox', { name: 'Name this design' }).fill('Eliza’s daisy bishop');
  await page.getByRole('button', { name: 'Save and order' }).click();

  await expect(page.getByRole('heading', { name: 'Order “Eliza’s daisy bishop”' })).toBeVisible();
  const orderPrice = page.getByRole('complementary', { name: 'Your order' });
  await expect(orderPrice.getByRole('row', { name: /^Total/ })).toHaveText(designTotal);
  await expect(page.getByText(/Ready by .* at the usual pace/)).toBeVisible();
  await page.getByRole('button', { name: 'One more' }).click();
  await expect(orderPrice.getByRole('row', { name: /^Total/ })).not.toHaveText(designTotal);
  await page.getByRole('button', { name: 'One fewer' }).click();
  await expect(orderPrice.getByRole('row', { name: /^Total/ })).toHaveText(designTotal);

  // The server's field messages appear beside the fields.
  await page.getByRole('button', { name: 'Continue to payment' }).click();
  await expect(page.getByText('Enter the street address')).toBeVisible();
  await page.getByLabel('Needed by').fill(neededBy);
  await fillAddress(page);
  await page.getByLabel('A note to the studio').fill('For her christening.');
  await page.screenshot({ path: screens('form'), fullPage: true });
  await page.getByRole('button', { name: 'Continue to payment' }).click();

  await payWith(page, '4242 4242 4242 4242');
  await expect(page).toHaveURL(/\/orders\/WB-\d+\?checkout=done$/);
  orderNumber = /WB-\d+/.exec(page.url())![0];
  await expect(page.getByRole('heading', { name: `Order ${orderNumber}` })).toBeVisible();
  await expect(page.getByText('Proof on its way')).toBeVisible();
  await expect(page.getByRole('region', { name: 'Payment' })).toContainText(
    'Your card is saved with our payment provider',
  );
  await expect(page.getByRole('list', { name: 'Where your order is' }).getByRole('listitem').nth(1)).toHaveAttribute(
    'aria-current',
    'step',
  );
  await page.screenshot({ path: screens('order-authorized'), fullPage: true });
});

test('when the card is declined, then the payment page says so, nothing is charged, and another card from the order page goes through', async ({
  page,
}) => {
  await page.goto('/orders');
  await signInAs(page, 'Priya Castellanos');
  await page.goto('/design/bishop-dress');
  await page.getByText('Add a name', { exact: true }).click();
  await page.getByRole('textbox', { name: 'Name or words' }).fill('Ada');
  await page.getByRole('button', { name: 'Add the name' }).click();
  await page.getByRole('textbox', { name: 'Name this design' }).fill('Ada’s name bishop');
  await page.getByRole('button', { name: 'Save and order' }).click();
  // A bigger size chosen at checkout carries the design to it and prices it again.
  const yourOrder = page.getByRole('complementary', { name: 'Your order' });
  await expect(page.getByRole('heading', { name: 'Order “Ada’s name bishop”' })).toBeVisible();
  await yourOrder.getByText('18 months', { exact: true }).click();
  await expect(yourOrder.getByRole('radio', { name: '18 months' })).toBeChecked();
  await expect(page.getByText('Your design is carried to this size')).toBeVisible();
  await expect(
    page.getByRole('complementary', { name: 'Your order' }).getByRole('cell', { name: /size 18 months/ }),
  ).toBeVisible();
  await page.getByLabel('Needed by').fill(neededBy);
  await fillAddress(page);
  await page.getByRole('button', { name: 'Continue to payment' }).click();

  await payWith(page, '4000 0000 0000 0002');
  await expect(page.getByRole('alert')).toHaveText('Your card was declined.');
  await page.screenshot({ path: screens('declined'), fullPage: true });
  await page.getByRole('link', { name: 'Cancel and return to the shop' }).click();
  await expect(page.getByText('Waiting for payment').first()).toBeVisible();
  await expect(page.getByText(/Ada’s name bishop: Bishop dress, 18 months/)).toBeVisible();
  const payment = page.getByRole('region', { name: 'Payment' });
  await expect(payment.getByRole('alert')).toContainText('Your card was declined.');
  await expect(payment).toContainText('Your card has not been charged');
  await page.screenshot({ path: screens('order-declined'), fullPage: true });
  await expect(payment).not.toContainText('held on your card');
  await expect(payment.getByRole('button', { name: 'Try another card' })).toBeVisible();
  const declinedNumber = /WB-\d+/.exec(page.url())![0];
  const db = openDatabase(loadDatabaseConfig());
  try {
    const row = await db('orders').where({ number: declinedNumber }).first();
    expect(row).toMatchObject({ status: 'awaiting_payment', payment_status: 'none' });
    const charged = await db('payments').where({ order_id: row.id }).sum({ cents: 'amount_captured_cents' }).first();
    expect(Number(charged?.cents ?? 0)).toBe(0);
  } finally {
    await db.destroy();
  }

  // Another card on a fresh payment page goes through.
  await payment.getByRole('button', { name: 'Try another card' }).click();
  await payWith(page, '4242 4242 4242 4242');
  await expect(page.getByText('Thank you! Your order is in')).toBeVisible();
  await expect(page.getByRole('region', { name: 'Payment' })).toContainText(
    'Your card is saved with our payment provider',
  );
});

test('when the studio sends proofs, then Priya pins a change on the first, approves the second, and the e-mails arrive', async ({
  page,
}) => {
  test.skip(!orderNumber, 'needs the order placed by the first journey');
  const db = openDatabase(loadDatabaseConfig());
  try {
    await sendTestProof(db, { orderNumber, message: 'Here is your proof, drawn to scale on the dress.' });
    await page.goto(`/orders/${orderNumber}`);
    await signInAs(page, 'Priya Castellanos');
    await expect(page.getByText('Proof ready for you')).toBeVisible();
    const proof = page.getByRole('region', { name: 'Your proof' });
    await expect(proof).toContainText('Version 1 · Waiting for your answer');

    // Tap the picture near the hem to drop a pin there; a second pin is added from the keyboard.
    const picture = proof.getByRole('img', { name: /Proof version 1/ });
    await expect
      .poll(() => picture.evaluate((image: HTMLImageElement) => image.complete && image.naturalWidth))
      .toBeGreaterThan(0);
    const box = (await picture.boundingBox())!;
    await picture.click({ position: { x: box.width * 0.5, y: box.height * 0.82 } });
    await proof.getByLabel('What should change at pin 1?').fill('Could the daisies be a little smaller?');
    await proof.getByRole('button', { name: 'Add a pin' }).focus();
    await page.keyboard.press('Enter');
    await proof.getByLabel('What should change at pin 2?').fill('A touch more space above the name, please.');
    await page.screenshot({ path: screens('proof-pins'), fullPage: true });
    await proof.getByRole('button', { name: 'Ask for these changes' }).click();
    await expect(page.getByText('Changes on their way')).toBeVisible();
    await expect(proof).toContainText('You asked for changes');

    await sendTestProof(db, {
      orderNumber,
      message: 'Smaller daisies and more room above the name.',
      image: await proofPicture(0x6c8a66ff),
    });
    await page.reload();
    await expect(proof.getByRole('button', { name: 'Version 2' })).toHaveAttribute('aria-pressed', 'true');
    await proof.getByRole('button', { name: 'Version 1' }).click();
    await expect(proof).toContainText('Could the daisies be a little smaller?');
    await proof.getByRole('button', { name: 'Version 2' }).click();
    await proof.getByRole('button', { name: 'Approve this proof' }).click();
    await expect(page.getByText('Approved, about to start')).toBeVisible();
    await page.screenshot({ path: screens('proof-approved'), fullPage: true });

    const accessibility = await new AxeBuilder({ page }).analyze();
    const serious = accessibility.violations.filter(
      (violation) => violation.impact === 'serious' || violation.impact === 'critical',
    );
    expect(serious.map((violation) => `${violation.id}: ${violation.help}`)).toEqual([]);

    const inbox = process.env.FAKE_SMTP_HTTP_URL;
    if (inbox) {
      await expect
        .poll(async () => {
          const messages = (await (await fetch(`${inbox}/messages?to=priya@example.test`)).json()) as {
            subject: string;
          }[];
          return messages.map((message) => message.subject);
        })
        .toEqual(
          expect.arrayContaining([`We have your order ${orderNumber}`, `You approved the proof for ${orderNumber}`]),
        );
    }
  } finally {
    await db.destroy();
  }
});

test('when the order page opens on a phone, then nothing runs off the side', async ({ page }) => {
  test.skip(!orderNumber, 'needs the order placed by the first journey');
  await page.goto(`/orders/${orderNumber}`);
  await signInAs(page, 'Priya Castellanos');
  await page.setViewportSize({ width: 390, height: 844 });
  await expect(page.getByRole('heading', { name: `Order ${orderNumber}` })).toBeVisible();
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  await page.screenshot({ path: screens('order-phone'), fullPage: true });
});
