import { expect, test } from '@playwright/test';
import { signInAs } from './support/sign-in.ts';

// WB-1009 (seeds/data/orders.ts) places Harriet's granddaughter's sun drawing (upload 1) on the romper's chest.
test('when Harriet opens her order, then “Your design” shows her uploaded drawing on the garment', async ({ page }) => {
  await page.goto('/');
  await signInAs(page, 'Harriet Okonkwo');
  await page.goto('/orders/WB-1009');
  const section = page.getByRole('region', { name: 'Your design' });
  const picture = section.getByRole('img', { name: /your design on the/i });
  await expect(picture).toBeVisible();
  const upload = picture.locator('image[href="/api/artwork/1/image"]');
  await expect(upload).toHaveCount(1);
  const box = await upload.boundingBox();
  expect(box?.width ?? 0).toBeGreaterThan(10);
  const image = await page.request.get('/api/artwork/1/image');
  expect(image.status()).toBe(200);
});
