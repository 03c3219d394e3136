import { expect, test } from '@playwright/test';
import { restartAppServer } from './support/app-server.ts';
import { signInAs } from './support/sign-in.ts';

test.describe.configure({ mode: 'serial' });

test('when a customer signs in, then the shop greets them by name and the studio app refuses them', async ({
  page,
}) => {
  await page.goto('/');
  await expect(page.getByRole('heading', { name: /choose a garment/i })).toBeVisible();
  await signInAs(page, 'Priya Castellanos');
  await expect(page.getByText('Signed in as')).toContainText('Priya Castellanos');

  await page.goto('/admin/');
  await expect(page.getByRole('heading', { name: /this area is for the studio team/i })).toBeVisible();
  await expect(page.getByRole('alert')).toContainText('customer account');

  await page.goto('/');
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page.getByRole('link', { name: 'Sign in' })).toBeVisible();
  await page.reload();
  await expect(page.getByRole('link', { name: 'Sign in' })).toBeVisible();
});

test('when the owner signs in to the studio app, then the home shows the orders, and the session survives a server restart', async ({
  page,
}) => {
  // Stopping and starting the API server (its pools, its worker and its threads) takes a while on a busy machine.
  test.setTimeout(90_000);
  await page.goto('/admin/');
  await expect(page.getByRole('heading', { name: 'Studio sign-in' })).toBeVisible();
  await signInAs(page, 'Marigold Ashby', /sign in with google/i);
  await expect(page.getByRole('heading', { name: /wren & bobbin/i })).toBeVisible();
  await expect(page.getByRole('list', { name: 'Orders by status' })).toBeVisible();
  await expect(page.getByRole('heading', { name: 'Latest orders' })).toBeVisible();

  await page.getByRole('link', { name: 'WB-1004' }).click();
  await expect(page.getByRole('heading', { name: 'Order WB-1004' })).toBeVisible();
  await expect(page.getByRole('heading', { name: 'History' })).toBeVisible();
  await expect(page.getByText(/Priced with price list version \d+/)).toBeVisible();
  await page.getByRole('link', { name: '← Today' }).click();

  await restartAppServer();
  await page.reload();
  await expect(page.getByRole('heading', { name: 'Latest orders' })).toBeVisible();
  await expect(page.getByText('Marigold Ashby')).toBeVisible();

  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page.getByRole('heading', { name: 'Studio sign-in' })).toBeVisible();
});

test('when the pages load, then nothing is fetched from any host but this one', async ({ page }) => {
  const foreign: string[] = [];
  page.on('request', (request) => {
    const url = new URL(request.url());
    if (!['127.0.0.1', 'localhost'].includes(url.hostname) && url.protocol !== 'data:' && url.protocol !== 'blob:')
      foreign.push(request.url());
  });
  const cspErrors: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error' && /Content Security Policy/i.test(message.text())) cspErrors.push(message.text());
  });
  await page.goto('/');
  await expect(page.getByRole('heading', { name: /choose a garment/i })).toBeVisible();
  await page
    .getByRole('link')
    .filter({ hasText: /bishop dress/i })
    .first()
    .click();
  await expect(page.getByRole('heading', { name: /borders all the way round/i })).toBeVisible();
  await page.goto('/admin/');
  await expect(page.getByRole('heading', { name: 'Studio sign-in' })).toBeVisible();
  // Wait for the face to arrive before asking: a check right after first paint can race the font file.
  expect(
    await page.evaluate(
      async () => (await document.fonts.load('500 16px Poppins'), document.fonts.check('500 16px Poppins')),
    ),
  ).toBe(true);
  expect(foreign).toEqual([]);
  expect(cspErrors).toEqual([]);
});

test('when a keyboard user arrives on a phone-width screen, then the first Tab offers a skip to the page and the garments stack in one column', async ({
  page,
}) => {
  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto('/');
  await expect(page.getByRole('heading', { name: /choose a garment/i })).toBeVisible();
  await page.keyboard.press('Tab');
  await expect(page.getByRole('link', { name: 'Skip to the page' })).toBeFocused();
  const cards = page.getByRole('listitem').filter({ has: page.getByRole('heading', { level: 3 }) });
  const [first, second] = [await cards.nth(0).boundingBox(), await cards.nth(1).boundingBox()];
  expect(second!.y).toBeGreaterThan(first!.y + first!.height - 1);
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
});

test('when staff open the studio app on a phone, then nothing runs off the side of the screen', async ({ page }) => {
  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto('/admin/');
  await signInAs(page, 'Tobias Fenwick', /sign in with google/i);
  await expect(page.getByRole('heading', { name: 'Latest orders' })).toBeVisible();
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  await page.getByRole('link', { name: 'Catalogue' }).click();
  await expect(page.getByRole('heading', { name: 'Thread palette' })).toBeVisible();
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
});
