import { expect, test } from '@playwright/test';

test('when a parent picks a size and colour on the garment page and opens the designer, then the designer starts in them', async ({
  page,
}) => {
  await page.goto('/garments/smocked-yoke-dress');
  await page.getByRole('group', { name: 'Size' }).getByText('18 months', { exact: true }).click();
  await page.getByRole('link', { name: 'Design this garment' }).click();
  await expect(page).toHaveURL(/\/design\/smocked-yoke-dress$/);
  await expect(page.getByRole('group', { name: 'Size' }).getByRole('radio', { name: '18 months' })).toBeChecked();
  await expect(page.getByRole('group', { name: 'Size' }).getByRole('radio', { name: '6 months' })).not.toBeChecked();
});
