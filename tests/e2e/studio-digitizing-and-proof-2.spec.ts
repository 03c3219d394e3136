import { expect, test } from '@playwright/test';
import { loadDatabaseConfig } from '../../server/src/config.ts';
import { openDatabase, type Db } from '../../server/src/db/knex.ts';
import { requestChangesAsCustomer } from '../support/studio-order-support.ts';
import { signInAs } from './support/sign-in.ts';

test.describe.configure({ mode: 'serial' });
let db: Db;
test.beforeAll(() => {
  db = openDatabase(loadDatabaseConfig(process.env));
});
test.afterAll(async () => {
  await db.destroy();
});

test('when staff enter a picture’s stitch file, send proof 1, and after a change asked for edit the design, then proof 2 goes out with its change and price', async ({
  page,
}) => {
  // The server draws three pictures (proof 1, the editor's drawing, proof 2): about a second each when idle.
  test.setTimeout(120_000);
  await page.goto('/admin/');
  await signInAs(page, 'Tobias Fenwick', /sign in with google/i);
  // WB-1009 places Harriet's granddaughter's drawing; Today lists it until its stitch file is entered.
  const toDigitize = page.getByRole('region', { name: /Pictures to digitize/ });
  await expect(toDigitize.getByRole('link', { name: 'WB-1009' })).toBeVisible();
  await toDigitize.getByRole('link', { name: 'WB-1009' }).click();
  await expect(page.getByRole('heading', { name: 'Order WB-1009' })).toBeVisible();

  const stitchFile = page.getByRole('form', { name: 'Stitch file for the customer’s picture' });
  await stitchFile.getByLabel('Stitch count').fill('42,000');
  await stitchFile.getByLabel('Colours').fill('4');
  await stitchFile.getByLabel('Stitch file name').fill('lily-sun-56mm.dst');
  await stitchFile.getByRole('button', { name: 'Save and price' }).click();
  await expect(stitchFile.getByText(/more than the customer authorized/)).toBeVisible();

  await page.getByRole('button', { name: 'Send proof' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'Proof 1 is on its way' })).toBeVisible({ timeout: 30_000 });
  await requestChangesAsCustomer(db, 'WB-1009', 'Could the sun sit a little higher?', new Date());
  await page.reload();

  await page.getByRole('link', { name: 'Change the design' }).click();
  await expect(page.getByRole('heading', { name: 'Change the design of WB-1009' })).toBeVisible();
  const picture = page.getByRole('group', { name: 'The customer’s picture' });
  const down = picture.getByLabel('Down from the top (mm)');
  await down.fill(String(Number(await down.inputValue()) - 5));
  await picture.getByLabel('Width (mm)').fill('60');
  await expect(page.getByText('Your picture moved 5 mm up, made 60 mm wide instead of 56 mm')).toBeVisible({
    timeout: 30_000,
  });
  await expect(page.getByRole('img', { name: 'The changed design drawn on the garment' })).toBeVisible({
    timeout: 30_000,
  });
  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot({ path: 'test-results/screens/studio-design-editor-phone.png', fullPage: true });
  await page.getByRole('button', { name: 'Send proof 2' }).click();

  await expect(page.getByRole('heading', { name: 'Order WB-1009' })).toBeVisible({ timeout: 30_000 });
  const changes = page.getByRole('list', { name: 'Changes in proof 2' });
  await expect(changes.getByText('Your picture moved 5 mm up, made 60 mm wide instead of 56 mm')).toBeVisible();
  await expect(page.getByText(/Price with this proof:/).first()).toBeVisible();
});
