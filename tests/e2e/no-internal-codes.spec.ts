import { expect, test, type Page } from '@playwright/test';
import { signInAs } from './support/sign-in.ts';

/**
 * Internal codes never reach a screen or an address a person reads (issue 12, point 11): snake_case codes (zones
 * such as `bib_centre`, statuses such as `proof_sent`, guidance codes), the catalogue's size codes (`0-3m`, `6m`)
 * and the delivery method's code (`pickup`). Plain English words that are also codes (`hem`, `small`, `owner`) are
 * the labels themselves, so they are not looked for.
 */
const CODE_PATTERNS: [string, RegExp][] = [
  ['a snake_case code', /\b[a-z]+_[a-z_]+\b/],
  ['a size code', /\b\d{1,2}(-\d{1,2})?m\b/],
  ['the pick-up method code', /\bpickup\b/],
];

async function codesOn(page: Page, path: string): Promise<string[]> {
  await page.goto(path);
  await expect(page.getByRole('heading', { level: 1 }).first()).toBeVisible();
  await page.waitForLoadState('networkidle');
  const text = await page.locator('body').innerText();
  const found: string[] = [];
  for (const [what, pattern] of CODE_PATTERNS) {
    const inText = pattern.exec(text);
    if (inText) found.push(`${path}: ${what} on the screen (“${inText[0]}”)`);
    const inUrl = pattern.exec(decodeURIComponent(new URL(page.url()).pathname + new URL(page.url()).search));
    if (inUrl) found.push(`${path}: ${what} in the address (“${inUrl[0]}”)`);
  }
  // A role shown as its code ("staff" beside the signed-in name) instead of its words ("Studio team").
  const bareRole = /^\s*(customer|staff|owner)\s*$/m.exec(text);
  if (bareRole) found.push(`${path}: the role code “${bareRole[1]}” on the screen`);
  return found;
}

test('when a parent goes through the storefront’s pages, then no internal code shows on them or in their addresses', async ({
  page,
}) => {
  await page.goto('/');
  await signInAs(page, 'Harriet Okonkwo');
  const found: string[] = [];
  for (const path of ['/', '/garments/bishop-dress', '/design/bishop-dress', '/designs', '/orders', '/orders/WB-1009'])
    found.push(...(await codesOn(page, path)));
  expect(found).toEqual([]);
});

test('when the studio goes through its pages, then no internal code shows on them or in their addresses', async ({
  page,
}) => {
  test.setTimeout(90_000);
  await page.goto('/admin/');
  // The owner sees every studio page, People included.
  await signInAs(page, 'Marigold Ashby', /sign in with google/i);
  const found: string[] = [];
  for (const path of [
    '/admin/',
    '/admin/orders',
    '/admin/orders/WB-1009',
    '/admin/orders/WB-1009/production',
    '/admin/catalogue',
    '/admin/pricing',
    '/admin/settings',
    '/admin/people',
    '/admin/outbox',
  ])
    found.push(...(await codesOn(page, path)));
  expect(found).toEqual([]);
});
