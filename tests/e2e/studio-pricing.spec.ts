import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { signInAs } from './support/sign-in.ts';

// Each journey runs an accessibility scan or two, which takes a while on a busy machine.
test.describe.configure({ mode: 'serial', timeout: 60_000 });

const shots = 'test-results/screens';

/** Accessibility rules that fail on this page, as "rule: where" lines (axe-core's WCAG 2 A and AA checks). */
async function accessibilityProblems(page: Page): Promise<string[]> {
  // The outbox's sandboxed frame runs no scripts, so axe could only wait for it: it is left out.
  const results = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa']).exclude('iframe').analyze();
  return results.violations.flatMap((violation) =>
    violation.nodes.map((node) => `${violation.id}: ${node.target.join(' ')}`),
  );
}

async function signInAsOwner(page: Page): Promise<void> {
  await page.goto('/admin/');
  await signInAs(page, 'Marigold Ashby', /sign in with google/i);
}

test('when the owner opens Today, then the day’s work, machine hours against capacity and weekly takings are shown, also at phone width', async ({
  page,
}) => {
  await signInAsOwner(page);
  await expect(page.getByRole('heading', { name: 'Proofs to send' })).toBeVisible();
  await expect(page.getByRole('heading', { name: 'Stitched, ready to ship' })).toBeVisible();
  const hours = page.getByRole('region', { name: 'Machine hours booked' });
  const takings = page.getByRole('region', { name: 'Takings by week' });
  await expect(hours.locator('svg.recharts-surface')).toBeVisible();
  await expect(takings.locator('svg.recharts-surface')).toBeVisible();
  await expect(hours.locator('figcaption')).toContainText('of 30 h');
  await expect(takings.locator('figcaption')).toContainText('taken over the last 8 weeks');
  await hours.getByText('Machine hours as a table').click();
  await expect(hours.getByRole('table')).toContainText('Capacity');
  await page.screenshot({ path: `${shots}/studio-today.png`, fullPage: true });
  expect(await accessibilityProblems(page)).toEqual([]);

  await page.setViewportSize({ width: 390, height: 844 });
  await expect(takings.locator('svg.recharts-surface')).toBeVisible();
  const box = await takings.boundingBox();
  expect(box!.width).toBeLessThanOrEqual(390);
  await page.screenshot({ path: `${shots}/studio-today-phone.png`, fullPage: true });
});

test('when the owner raises the stitch rate in the draft, then the three sample quotes change, and publishing makes it the price list', async ({
  page,
}) => {
  await signInAsOwner(page);
  await page.getByRole('navigation', { name: 'Studio sections' }).getByRole('link', { name: 'Pricing' }).click();
  await expect(page.getByRole('heading', { name: /Version 2 · draft/ })).toBeVisible();
  const samples = page.getByRole('region', { name: 'How these prices change three recent quotes' });
  const rows = samples.getByRole('table').getByRole('row');
  await expect(rows).toHaveCount(4);
  const largest = rows.filter({ hasText: 'Largest' });
  const before = await largest.getByRole('cell').nth(1).innerText();

  const rate = page.getByLabel('Rate per 1,000 stitches', { exact: true });
  await rate.fill('2.50');
  await expect(largest.getByRole('cell').nth(1)).not.toHaveText(before);
  await expect(largest.getByRole('cell').nth(2)).toContainText('+');
  await page.screenshot({ path: `${shots}/studio-pricing-draft.png`, fullPage: true });
  expect(await accessibilityProblems(page)).toEqual([]);

  await page.getByRole('button', { name: 'Save draft' }).click();
  await expect(page.getByText('Draft saved.')).toBeVisible();
  await page.getByRole('button', { name: 'Publish version 2…' }).click();
  await page.getByRole('button', { name: 'Yes, publish version 2' }).click();
  await expect(page.getByRole('heading', { name: /Version 2 · published/ })).toBeVisible();
  const versions = page.getByRole('table').first();
  await expect(versions.getByRole('row').nth(1)).toContainText('Published');
  await expect(versions.getByRole('row').nth(2)).toContainText('Retired');
  await expect(page.getByLabel('Rate per 1,000 stitches', { exact: true })).toHaveValue('2.50');
  await expect(page.getByRole('button', { name: 'Start a new draft' })).toBeVisible();
  await page.screenshot({ path: `${shots}/studio-pricing-published.png`, fullPage: true });
});

test('when the owner adds a customer to the studio team, then the change shows at once, and taking it back restores them', async ({
  page,
}) => {
  await signInAsOwner(page);
  await page.getByRole('link', { name: 'People' }).click();
  // The People page loads when opened; until it has, Today's order rows also name Dominic, so take his person row.
  const dominic = page
    .getByRole('row', { name: /Dominic Lark/ })
    .filter({ has: page.getByRole('button', { name: /Dominic Lark (to|from) the studio team/ }) });
  await expect(dominic).toContainText('Customer');
  await dominic.getByRole('button', { name: 'Add Dominic Lark to the studio team' }).click();
  await expect(dominic).toContainText('Studio team');
  await page.screenshot({ path: `${shots}/studio-people.png`, fullPage: true });
  expect(await accessibilityProblems(page)).toEqual([]);
  // Later journeys sign in as Dominic the customer.
  await dominic.getByRole('button', { name: 'Remove Dominic Lark from the studio team' }).click();
  await expect(dominic).toContainText('Customer');
});

test('when the owner opens the outbox, then a message reads in full and a failed one says why', async ({ page }) => {
  await signInAsOwner(page);
  await page.getByRole('link', { name: 'Outbox' }).click();
  const list = page.getByRole('region', { name: 'Messages' });
  await expect(list.getByRole('listitem').first()).toBeVisible();
  await list.getByRole('listitem').first().getByRole('link').click();
  const message = page.getByRole('region', { name: 'Message' });
  await expect(message.locator('pre')).toContainText('Wren & Bobbin');
  expect(await accessibilityProblems(page)).toEqual([]);
  await message.getByRole('button', { name: 'As designed' }).click();
  await expect(message.frameLocator('iframe').locator('body')).toContainText('Wren & Bobbin');
  await page.screenshot({ path: `${shots}/studio-outbox.png`, fullPage: true });

  await list.getByLabel('Status').selectOption('failed');
  await expect(list.getByText('Page 1 of 1 · 1 message', { exact: true })).toBeVisible();
  await expect(list.getByText(/Not delivered: SMTP 451/)).toBeVisible();
  await list.getByRole('link', { name: 'Your proof for WB-1008 is ready' }).click();
  await expect(page).toHaveURL(/\/admin\/outbox\/\d+\?status=failed$/);
  await expect(message.getByRole('heading', { name: 'Your proof for WB-1008 is ready' })).toBeVisible();
  await expect(message.getByRole('note')).toContainText('This one was not delivered');
  await expect(message.locator('pre')).toContainText('Your proof for WB-1008 is ready');
  await page.screenshot({ path: `${shots}/studio-outbox-failed.png`, fullPage: true });
});

test('when the owner lowers the weekly machine hours in Settings, then Today draws the capacity line there', async ({
  page,
}) => {
  await signInAsOwner(page);
  await page.getByRole('link', { name: 'Settings' }).click();
  const hoursField = page.getByLabel('Machine hours a week');
  await expect(hoursField).toHaveValue('30');
  await hoursField.fill('200');
  await page.getByRole('button', { name: 'Save settings' }).click();
  await expect(page.getByText('A week has 168 hours')).toBeVisible();
  await hoursField.fill('2');
  await page.getByRole('button', { name: 'Save settings' }).click();
  await expect(page.getByText('Saved. New quotes use these figures.')).toBeVisible();
  await page.screenshot({ path: `${shots}/studio-settings.png`, fullPage: true });

  await page.getByRole('link', { name: 'Today' }).click();
  await expect(page.getByRole('region', { name: 'Machine hours booked' }).locator('figcaption')).toContainText(
    'of 2 h',
  );
  // Later journeys expect the seeded capacity.
  await page.getByRole('link', { name: 'Settings' }).click();
  await page.getByLabel('Machine hours a week').fill('30');
  await page.getByRole('button', { name: 'Save settings' }).click();
  await expect(page.getByText('Saved. New quotes use these figures.')).toBeVisible();
});

test('when the owner closes the shop on the day an order would be ready, then the shop’s ready date moves on a working day', async ({
  page,
}) => {
  await signInAsOwner(page);
  const readyDate = async () => (await (await page.request.get('/api/quotes/ready-dates')).json()).earliestReadyDate;
  const before: string = await readyDate();
  await page.getByRole('link', { name: 'Settings' }).click();
  await expect(page.getByLabel('Time zone')).toHaveValue('America/Chicago');
  await expect(page.getByRole('checkbox', { name: 'Saturday' })).toBeChecked();
  await expect(page.getByRole('checkbox', { name: 'Monday' })).not.toBeChecked();
  const closedDays = page.getByLabel('Holidays and other closed days');
  await closedDays.fill('2026-11-31');
  await page.getByRole('button', { name: 'Save settings' }).click();
  await expect(page.getByText('That day does not exist')).toBeVisible();
  await closedDays.fill(before);
  await page.getByRole('button', { name: 'Save settings' }).click();
  await expect(page.getByText('Saved. New quotes use these figures.')).toBeVisible();
  await page.screenshot({ path: `${shots}/studio-settings-closed-days.png`, fullPage: true });
  // The lead time's last working day is now a closed day, so the count runs one working day further.
  const after: string = await readyDate();
  expect(after > before).toBe(true);

  // Later journeys expect the seeded calendar.
  await closedDays.fill('');
  await Promise.all([
    page.waitForResponse((response) => response.url().endsWith('/api/admin/settings') && response.ok()),
    page.getByRole('button', { name: 'Save settings' }).click(),
  ]);
  expect(await readyDate()).toBe(before);
});
