import { expect, test } from '@playwright/test';

test('when the window shrinks from desktop to phone width, then the designer canvas shrinks with it', async ({
  page,
}) => {
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.goto('/design/bishop-dress');
  const canvas = page
    .getByRole('group', { name: /^The bishop dress in size .*, with your design$/ })
    .locator('canvas')
    .first();
  await expect(canvas).toBeVisible();
  expect((await canvas.boundingBox())!.width).toBeGreaterThan(500);

  await page.setViewportSize({ width: 390, height: 844 });
  await expect.poll(async () => (await canvas.boundingBox())!.width).toBeLessThanOrEqual(390);
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
});
