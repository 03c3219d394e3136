import { expect, test } from '@playwright/test';
import { signInAs } from './support/sign-in.ts';

test('when a parent moves between storefront pages, then each names its own browser tab', async ({ page }) => {
  await page.goto('/');
  await expect(page).toHaveTitle('Garments to personalize · Wren & Bobbin');
  await page.goto('/garments/smocked-yoke-dress');
  await expect(page).toHaveTitle(/^Smocked yoke dress · Wren & Bobbin$/i);
  await page.getByRole('link', { name: 'Design this garment' }).click();
  await expect(page).toHaveTitle(/^Design your smocked yoke dress · Wren & Bobbin$/i);
  await page.goto('/no-such-page');
  await expect(page).toHaveTitle('Page not found · Wren & Bobbin');
});

test('when the studio moves between its pages, then each names its own browser tab', async ({ page }) => {
  await page.goto('/admin/orders');
  await signInAs(page, 'Tobias Fenwick', /sign in with google/i);
  await expect(page).toHaveTitle('Orders · Hoopwright studio');
  await page.goto('/admin/orders/WB-1008');
  await expect(page).toHaveTitle('Order WB-1008 · Hoopwright studio');
  await page.goto('/admin/');
  await expect(page).toHaveTitle('Today · Hoopwright studio');
});
