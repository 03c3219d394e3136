import { expect, test, type Page } from '@playwright/test';
import { signInAs } from './support/sign-in.ts';

// The designer and checkout both load Fabric or price on the server: more than the usual 30 s on a shared machine.
test.describe.configure({ mode: 'serial', timeout: 60_000 });

const price = (page: Page) => page.getByRole('region', { name: 'Your price' });
const count = (text: string, pattern: RegExp) => Number(pattern.exec(text)?.[1]?.replace(/,/g, '') ?? Number.NaN);

test('when Priya opens her smocked dress in the designer, then the price panel shows each unit rate and its hoopings agree with the stitching notes', async ({
  page,
}) => {
  await page.goto('/garments/bishop-dress');
  await signInAs(page, 'Priya Castellanos');
  await page.goto('/design/smocked-yoke-dress?design=1');
  const panel = price(page);
  await expect(panel.getByRole('row', { name: /^Total \$\d+\.\d\d$/ })).toBeVisible();
  await expect(panel.getByText(/^at \$\d+\.\d\d per 1,000 stitches/).first()).toBeVisible();
  await expect(panel.getByText(/^at \$\d+\.\d\d per garment$/)).toBeVisible();
  await expect(panel.getByRole('cell', { name: /^Delivery to your address/ })).toBeVisible();

  // The re-hooping line and the notes' "In all" speak of the same hoopings.
  const totals = (await panel.getByLabel('Hoopings and thread changes in all').textContent()) ?? '';
  const inAll = count(totals, /In all: ([\d,]+) hooping/);
  expect(inAll).toBeGreaterThan(1);
  const rehooping = panel.getByRole('cell', { name: /^Re-hooping:/ });
  if (await rehooping.count()) {
    await expect(rehooping).toContainText(`of ${inAll} hoopings in all`);
    await expect(rehooping.getByText(/^at \$\d+\.\d\d per extra hooping$/)).toBeVisible();
  }
  const listed = await panel.getByRole('list').first().getByRole('listitem').allTextContents();
  expect(listed.reduce((sum, item) => sum + count(item, /([\d,]+) hoopings?$/), 0)).toBe(inAll);
});

test('when Priya chooses pick-up at checkout, then the shipping line and total follow, and her saved address fills the form', async ({
  page,
}) => {
  await page.goto('/garments/bishop-dress');
  await signInAs(page, 'Priya Castellanos');
  await page.goto('/checkout/1');
  const order = page.getByRole('complementary', { name: 'Your order' });
  const choice = order.getByRole('group', { name: 'How should it reach you?' });
  await expect(choice.getByRole('radio', { name: /Delivery to your address/ })).toBeChecked();
  await expect(order.getByRole('cell', { name: /^Delivery to your address/ })).toBeVisible();
  await expect(choice).toContainText('Free on orders of $75.00 or more before tax');

  await choice.getByRole('radio', { name: /Pick up at the studio/ }).check();
  await expect(order.getByRole('cell', { name: 'Pick up at the studio', exact: true })).toBeVisible();
  await expect(choice).toContainText('Collect from the studio, 14 Mill Lane');
  await expect(page.getByRole('group', { name: 'Your address' })).toBeVisible();

  await page.getByRole('button', { name: /^Use Priya Castellanos, 48 Larkspur Lane/ }).click();
  await expect(page.getByLabel('Street address')).toHaveValue('48 Larkspur Lane');
  await expect(page.getByLabel('Town or city')).toHaveValue('Fernhollow');

  // At phone width the choice stays usable by keyboard: back to delivery with the arrow keys.
  await page.setViewportSize({ width: 390, height: 844 });
  await choice.getByRole('radio', { name: /Pick up at the studio/ }).focus();
  await page.keyboard.press('ArrowUp');
  await expect(choice.getByRole('radio', { name: /Delivery to your address/ })).toBeChecked();
  await expect(order.getByRole('cell', { name: /^Delivery to your address/ })).toBeVisible();
});
