import { expect, test } from '@playwright/test';

test('when a parent opens the bishop dress, then each border shows how many repeats fit the chosen size, drawn on the hem', async ({
  page,
}) => {
  await page.goto('/');
  await page
    .getByRole('link')
    .filter({ hasText: /bishop dress/i })
    .first()
    .click();
  await page.getByRole('radio', { name: '6 months' }).check({ force: true });
  // The trade's worked case (common practice, no source): a 692 mm hem loop holds 4 repeats of a 180 mm motif at 173 mm.
  const daisy = page.getByRole('listitem').filter({ has: page.getByRole('heading', { name: 'Daisy and leaf chain' }) });
  await expect(daisy).toContainText('4 repeats, each 173 mm · 6 ¹³⁄₁₆ in (96.1 % of its drawn size)');
  await expect(
    daisy.getByRole('img', { name: 'The hem unrolled: 4 repeats of Daisy and leaf chain all the way round' }),
  ).toBeVisible();
  await expect(daisy.locator('img')).toHaveCount(4);

  // The price is the server's: garment, stitches and re-hooping, itemized on request.
  await expect(daisy.locator('summary')).toContainText(/\$\d+\.\d\d for the bishop dress with this border/);
  await daisy.getByText("How it's priced").click();
  await expect(daisy.getByRole('cell', { name: /^Re-hooping: 3 extra hoopings/ })).toBeVisible();
  await expect(daisy).toContainText('sewn in 4 hoopings');

  await page.getByRole('radio', { name: '3T' }).check({ force: true });
  await expect(daisy).not.toContainText('4 repeats');
  await page.getByRole('button', { name: 'Blush' }).click();
  await expect(page.getByText('Fabric colour: Blush')).toBeVisible();
  await expect(page.getByRole('button', { name: 'Blush' })).toHaveAttribute('aria-pressed', 'true');
});
