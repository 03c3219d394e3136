import { expect, test, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { loadDatabaseConfig } from '../../server/src/config.ts';
import { openDatabase, type Db } from '../../server/src/db/knex.ts';
import { approveLatestProofAsCustomer, holdCardAtFake, stripeAt } from '../support/studio-order-support.ts';
import { signInAs } from './support/sign-in.ts';

test.describe.configure({ mode: 'serial' });

const shots = (name: string) => `test-results/screens/studio-orders-${name}.png`;
let db: Db;

/** WCAG 2 A and AA rules checked by axe-core over the page's main area. */
async function accessibilityProblems(page: Page): Promise<string[]> {
  const { violations } = await new AxeBuilder({ page }).include('main').withTags(['wcag2a', 'wcag2aa']).analyze();
  return violations.map(
    (violation) => `${violation.id}: ${violation.nodes.map((node) => node.target.join(' ')).join(', ')}`,
  );
}

test.beforeAll(async () => {
  db = openDatabase(loadDatabaseConfig(process.env));
  // WB-1010 is seeded with its card held; hold it for real at the payment stand-in this stack runs.
  const stripe = stripeAt(process.env.STRIPE_API_URL!, process.env.STRIPE_SECRET_KEY!);
  await holdCardAtFake(db, stripe, 'WB-1010', new Date(Date.now() + 6 * 86_400_000));
});
test.afterAll(async () => {
  await db.destroy();
});

test('when staff proof an order and the customer approves, then approve & charge puts it on the machine', async ({
  page,
}) => {
  // The server draws the proof twice (preview, then the proof itself): about a second each on an idle machine.
  test.setTimeout(90_000);
  await page.goto('/admin/orders');
  await signInAs(page, 'Tobias Fenwick', /sign in with google/i);
  await expect(page.getByRole('heading', { name: 'Orders' })).toBeVisible();

  // The board filters by status: only orders with a proof to send.
  await page
    .getByRole('group', { name: 'Show orders that are' })
    .getByRole('button', { name: 'Proof to send' })
    .click();
  // The address names the status in words, never its stored code.
  await expect(page).toHaveURL(/status=proof-to-send/);
  const table = page.getByRole('table');
  await expect(table.getByRole('link', { name: 'WB-1010' })).toBeVisible();
  await expect(table.getByRole('link', { name: 'WB-1004' })).toHaveCount(0);
  await page.screenshot({ path: shots('board-proof-to-send'), fullPage: true });
  expect(await accessibilityProblems(page)).toEqual([]);

  await table.getByRole('link', { name: 'WB-1010' }).click();
  await expect(page.getByRole('heading', { name: 'Order WB-1010' })).toBeVisible();
  await page.getByRole('button', { name: 'Preview the drawing' }).click();
  await expect(page.getByRole('img', { name: 'Preview of the drawing the customer would get' })).toBeVisible({
    timeout: 30_000,
  });
  await page.getByRole('button', { name: 'Send proof' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'Proof 1 is on its way' })).toBeVisible({ timeout: 30_000 });
  await expect(page.getByRole('img', { name: /Proof 1, the design drawn on the garment/ })).toBeVisible();
  await expect(page.getByText('Waiting on customer').first()).toBeVisible();
  await page.screenshot({ path: shots('proof-sent'), fullPage: true });
  expect(await accessibilityProblems(page)).toEqual([]);

  // The customer's approval belongs to the storefront; here it is made as that endpoint makes it.
  await approveLatestProofAsCustomer(db, 'WB-1010', new Date());
  await page.reload();
  await page.getByRole('button', { name: /Approve & charge/ }).click();
  await page.getByRole('button', { name: 'Charge the card' }).click();
  await expect(page.getByText('On the machine').first()).toBeVisible();
  await expect(page.getByText('Card charged')).toBeVisible();
  await page.screenshot({ path: shots('charged'), fullPage: true });

  await page.goto('/admin/orders?status=on-the-machine');
  await expect(page.getByRole('table').getByRole('link', { name: 'WB-1010' })).toBeVisible();
  await expect(page.getByRole('button', { name: 'On the machine' })).toHaveAttribute('aria-pressed', 'true');
});

test('when staff look at due dates or use a phone, then the calendar marks rush orders and the board becomes cards', async ({
  page,
}) => {
  await page.goto('/admin/orders');
  await signInAs(page, 'Tobias Fenwick', /sign in with google/i);
  await page.getByRole('button', { name: 'Due dates' }).click();
  await expect(page).toHaveURL(/view=calendar/);
  await expect(page.getByRole('button', { name: 'Due dates' })).toHaveAttribute('aria-pressed', 'true');
  await expect(page.getByRole('link', { name: /WB-1004/ }).first()).toBeVisible();
  await page.screenshot({ path: shots('calendar'), fullPage: true });
  expect(await accessibilityProblems(page)).toEqual([]);

  await page.getByRole('button', { name: 'List' }).click();
  await page.getByRole('table').getByRole('button', { name: 'Harriet Okonkwo' }).first().click();
  await expect(page.getByText('Only the orders of')).toContainText('Harriet Okonkwo');
  await expect(page.getByRole('table').getByRole('button', { name: 'Priya Castellanos' })).toHaveCount(0);
  await page.getByRole('button', { name: 'Show every customer' }).click();
  await expect(page.getByRole('table').getByRole('button', { name: 'Priya Castellanos' }).first()).toBeVisible();

  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto('/admin/orders?sort=due&dir=asc');
  const cards = page.getByRole('list', { name: 'Orders' });
  await expect(cards.getByRole('link', { name: 'WB-1003' })).toBeVisible();
  await page.getByRole('searchbox', { name: 'Search' }).fill('castellanos');
  await expect(page).toHaveURL(/q=castellanos/);
  await expect(cards.getByText('Harriet Okonkwo')).toHaveCount(0);
  await expect(cards.getByText('Priya Castellanos').first()).toBeVisible();
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  await page.screenshot({ path: shots('board-phone'), fullPage: true });
});
