import { expect, test, type Browser, type Page } from '@playwright/test';
import { signInAs } from './support/sign-in.ts';

/**
 * One order's whole life, through the apps alone (issue 12): Harriet orders a dress with her granddaughter's own
 * drawing and a name, her card kept for later; the studio enters the drawing's stitch file and sends proof 1 with
 * the drawing on it; Harriet pins a change; the studio moves the drawing in its editor and sends proof 2 at the new
 * price; Harriet approves it; a week after any hold would have lapsed, the studio charges the new total from the
 * saved card; the studio posts it with a tracking number, which both order pages show.
 *
 * Named to run after the journeys that hold cards (only whole-order.spec.ts, which saves its card, follows): it
 * moves the payment stand-in's clock on, which would lapse their holds.
 */
test.describe.configure({ mode: 'serial', timeout: 240_000 });

const shots = (name: string) => `test-results/screens/whole-order-life-${name}.png`;
const neededBy = new Date(Date.now() + 30 * 86_400_000).toISOString().slice(0, 10);
const money = (text: string) => Number(/\$([\d,]+\.\d{2})/.exec(text)![1].replace(/,/g, ''));
/** The order's total, from the line under its heading ("…, Christening White · $126.37 · needed by …"). */
const orderTotal = async (page: Page) => money((await page.getByText(/ · \$[\d,.]+ · needed by /).textContent())!);

/** A child's drawing of a rainbow over a hill: two filled shapes, so the server can count its stitches. */
const rainbow = Buffer.from(`<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 100 60">
  <path d="M10 50 A40 40 0 0 1 90 50 L80 50 A30 30 0 0 0 20 50 Z" fill="#D9534F"/>
  <path d="M0 60 Q50 30 100 60 Z" fill="#6BAF5B"/>
</svg>`);

async function personPage(browser: Browser, path: string, person: string, startLink?: RegExp): Promise<Page> {
  const page = await (await browser.newContext()).newPage();
  await page.goto(path);
  await signInAs(page, person, startLink);
  return page;
}

test('when a grandparent orders a dress with her granddaughter’s drawing, then it is proofed with the drawing, changed by the studio at her pin, approved at the new price, charged after the hold window and posted with tracking', async ({
  browser,
}) => {
  // The storefront: the drawing uploaded and placed, a name, saved and ordered; due in 30 days, so the card is
  // saved rather than held (a hold lasts about a week).
  const harriet = await personPage(browser, '/design/bishop-dress', 'Harriet');
  await harriet.getByText('Add your own picture', { exact: true }).click();
  await harriet
    .getByLabel('Choose a picture')
    .setInputFiles({ name: 'rainbow.svg', mimeType: 'image/svg+xml', buffer: rainbow });
  await expect(harriet.getByRole('radio', { name: 'rainbow.svg' })).toBeChecked({ timeout: 30_000 });
  await harriet.getByRole('button', { name: 'Put it on the garment' }).click();
  await harriet.getByText('Add a name', { exact: true }).click();
  await harriet.getByRole('textbox', { name: 'Name or words' }).fill('Juniper');
  await harriet.getByRole('button', { name: 'Add the name' }).click();
  const price = harriet.getByRole('region', { name: 'Your price' });
  await expect(price.getByRole('cell', { name: /^Your artwork: [\d,]+ stitches/ })).toBeVisible();
  await expect(price.getByRole('cell', { name: /^Lettering “Juniper”/ })).toBeVisible();
  await harriet.getByRole('textbox', { name: 'Name this design' }).fill('Juniper’s rainbow dress');
  await harriet.getByRole('button', { name: 'Save and order' }).click();

  await expect(harriet.getByRole('heading', { name: 'Order “Juniper’s rainbow dress”' })).toBeVisible();
  await harriet.getByLabel('Needed by').fill(neededBy);
  await harriet.getByLabel('Name', { exact: true }).fill('Harriet Okonkwo');
  await harriet.getByLabel('Street address').fill('7 Wrenfield Row');
  await harriet.getByLabel('Town or city').fill('Millbrook');
  await harriet.getByLabel('State, county or region').fill('VT');
  await harriet.getByLabel('Postal code').fill('05000');
  await harriet.getByRole('button', { name: 'Continue to payment' }).click();
  await expect(harriet.getByRole('heading', { name: 'Save your card' })).toBeVisible();
  await harriet.getByLabel('Card number').fill('4242 4242 4242 4242');
  await harriet.getByLabel('Expiry (MM/YY)').fill('12/30');
  await harriet.getByLabel('CVC').fill('123');
  await harriet.getByLabel('Name on card').fill('Harriet Okonkwo');
  await harriet.getByRole('button', { name: 'Save your card' }).click();
  await expect(harriet).toHaveURL(/\/orders\/WB-\d+\?checkout=done$/);
  const number = /WB-\d+/.exec(harriet.url())![0];
  // "Your design" draws her own drawing on the garment (point 2 of the issue).
  const drawnUpload = () =>
    harriet
      .getByRole('region', { name: 'Your design' })
      .getByRole('img', { name: /your design on the/i })
      .locator('image[href^="/api/artwork/"]');
  await expect(drawnUpload()).toHaveCount(1, { timeout: 15_000 });
  const authorizedTotal = await orderTotal(harriet);

  // The studio: the drawing's stitch file comes to more stitches than the estimate; proof 1 carries that price.
  const tobias = await personPage(browser, `/admin/orders/${number}`, 'Tobias Fenwick', /sign in with google/i);
  await expect(tobias.getByRole('heading', { name: `Order ${number}` })).toBeVisible();
  const stitchFile = tobias.getByRole('form', { name: /^Stitch file for/ });
  await stitchFile.getByLabel('Stitch count').fill('38,000');
  await stitchFile.getByLabel('Colours').fill('2');
  await stitchFile.getByLabel('Stitch file name').fill('juniper-rainbow.dst');
  await stitchFile.getByRole('button', { name: 'Save and price' }).click();
  await expect(stitchFile.getByText(/more than the customer authorized/)).toBeVisible();
  await tobias.getByLabel('Note to the customer').fill('Here is Juniper’s rainbow, drawn to scale.');
  await tobias.getByRole('button', { name: 'Send proof' }).click();
  await expect(tobias.getByRole('status').filter({ hasText: 'Proof 1 is on its way' })).toBeVisible({
    timeout: 60_000,
  });

  // The customer: proof 1 shows her drawing; she pins a change and asks for it.
  await harriet.goto(`/orders/${number}`);
  const proof = harriet.getByRole('region', { name: 'Your proof' });
  await expect(proof).toContainText('Version 1');
  await expect(proof.getByRole('img').first()).toBeVisible();
  await proof.getByRole('button', { name: 'Add a pin' }).click();
  await proof.getByLabel('What should change at pin 1?').fill('Could the rainbow sit a little higher, please?');
  await proof.getByRole('button', { name: 'Ask for this change' }).click();
  await expect(proof).toContainText('Could the rainbow sit a little higher, please?');
  await harriet.screenshot({ path: shots('change-asked'), fullPage: true });

  // The studio: the drawing moved up in the editor, re-priced by the server, sent as proof 2.
  await tobias.reload();
  await tobias.getByRole('link', { name: 'Change the design' }).click();
  await expect(tobias.getByRole('heading', { name: `Change the design of ${number}` })).toBeVisible();
  const picture = tobias.getByRole('group', { name: 'The customer’s picture' });
  const down = picture.getByLabel('Down from the top (mm)');
  await down.fill(String(Number(await down.inputValue()) - 5));
  await expect(tobias.getByText(/picture moved 5 mm up/).first()).toBeVisible({ timeout: 30_000 });
  await tobias.getByRole('button', { name: 'Send proof 2' }).click();
  await expect(tobias.getByRole('heading', { name: `Order ${number}` })).toBeVisible({ timeout: 60_000 });
  await expect(
    tobias.getByRole('list', { name: 'Changes in proof 2' }).getByText(/picture moved 5 mm up/),
  ).toBeVisible();

  // The customer: proof 2 shows the new price against the one before; she approves it.
  await harriet.reload();
  await expect(proof).toContainText('Version 2');
  await expect(proof).toContainText(/picture moved 5 mm up/);
  await expect(proof).toContainText(/New price/);
  await expect(drawnUpload()).toHaveCount(1, { timeout: 15_000 });
  await harriet.screenshot({ path: shots('proof-2'), fullPage: true });
  await proof.getByRole('button', { name: 'Approve this proof' }).click();
  await expect(harriet.getByText('Approved, about to start')).toBeVisible();
  const approvedTotal = await orderTotal(harriet);
  expect(approvedTotal).toBeGreaterThan(authorizedTotal);

  // A week after a hold placed at checkout would have lapsed: the stand-in's clock moves on 8 days.
  const clock = await fetch(`${process.env.STRIPE_API_URL}/_fake/clock`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ advanceSeconds: 8 * 86_400 }),
  });
  expect(clock.status).toBe(200);

  // The studio charges the approved total from the saved card, off-session.
  await tobias.reload();
  await expect(tobias.getByText(/saved/i).first()).toBeVisible();
  await tobias.getByRole('button', { name: /Approve & charge/ }).click();
  await tobias.getByRole('button', { name: 'Charge the card' }).click();
  await expect(tobias.getByText('Card charged')).toBeVisible({ timeout: 30_000 });
  await harriet.reload();
  await expect(harriet.getByRole('region', { name: 'Payment' })).toContainText(/charged/i);
  await expect(harriet.getByRole('region', { name: 'Payment' })).toContainText(
    `$${approvedTotal.toLocaleString('en-US', { minimumFractionDigits: 2 })}`,
  );

  // Stitched, then posted with a carrier and tracking number that both order pages show.
  await tobias.getByRole('button', { name: 'Mark stitched' }).click();
  await tobias.getByRole('button', { name: 'Mark posted or collected' }).click();
  const post = tobias.getByRole('form', { name: 'Post the order' });
  await post.getByLabel('Carrier').fill('Parcel post');
  await post.getByLabel('Tracking number (if the parcel has one)').fill('PP-2026-4471');
  await post.getByRole('button', { name: 'Posted: tell the customer' }).click();
  await expect(tobias.getByText('PP-2026-4471', { exact: true })).toBeVisible();
  await tobias.screenshot({ path: shots('posted-studio'), fullPage: true });
  await harriet.reload();
  await expect(harriet.getByText('PP-2026-4471', { exact: true })).toBeVisible();
  await expect(drawnUpload()).toHaveCount(1, { timeout: 15_000 });
  await harriet.screenshot({ path: shots('posted-customer'), fullPage: true });
});
