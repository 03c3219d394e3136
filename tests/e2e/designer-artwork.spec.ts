import { expect, test, type Page } from '@playwright/test';

const onTheGarment = (page: Page) => page.getByRole('region', { name: 'On the garment' });
const price = (page: Page) => page.getByRole('region', { name: 'Your price' });

/** A child's sunshine: a filled circle, rays as strokes, and a script that must never reach the page. */
const sunshine =
  Buffer.from(`<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 120 120" onload="document.title='pwned'">
  <script>document.title = 'pwned'</script>
  <circle cx="60" cy="60" r="30" fill="#F6D44A"/>
  <path d="M60 6V22M60 98V114M6 60H22M98 60H114" stroke="#F2A93B" stroke-width="6" stroke-linecap="round" fill="none"/>
</svg>`);
const gif = Buffer.from('R0lGODlhAQABAIAAAAAAAP///yH5BAEAAAAALAAAAAABAAEAAAIBRAA7', 'base64');

test('when a parent uploads a child’s drawing, then it uploads with a progress bar, goes on the garment, and the server prices it', async ({
  page,
}) => {
  await page.goto('/design/bishop-dress');
  await expect(page.getByRole('heading', { name: 'Design your bishop dress' })).toBeVisible();
  await page.getByText('Add your own picture', { exact: true }).click();
  const picker = page.getByLabel('Choose a picture');

  // A GIF is refused in place, with the server's reason.
  await picker.setInputFiles({ name: 'party.gif', mimeType: 'image/gif', buffer: gif });
  await expect(page.getByRole('alert').filter({ hasText: 'That file is a GIF file' })).toBeVisible();

  // Hold the server's answer back a moment, so the progress bar can be seen (and photographed) while it works.
  await page.route('**/api/artwork', async (route) => {
    if (route.request().method() !== 'POST') return route.continue();
    await new Promise((resolve) => setTimeout(resolve, 700));
    await route.continue();
  });
  await picker.setInputFiles({ name: 'sunshine.svg', mimeType: 'image/svg+xml', buffer: sunshine });
  const progress = page.getByRole('progressbar', { name: /Uploading sunshine\.svg/ });
  await expect(progress).toBeVisible();
  await page.screenshot({ path: 'test-results/screens/artwork-uploading.png', fullPage: true });
  await expect(progress).toBeHidden();
  await expect(page.getByRole('radio', { name: 'sunshine.svg' })).toBeChecked();
  await page.unroute('**/api/artwork');

  await page.getByRole('button', { name: 'Put it on the garment' }).click();
  const artwork = onTheGarment(page).getByRole('listitem').filter({ hasText: 'Your own artwork' });
  await expect(onTheGarment(page).getByRole('button', { name: /^Your own artwork/ })).toHaveAttribute(
    'aria-expanded',
    'true',
  );
  await expect(artwork.getByRole('status')).toHaveText(
    'In “Below the smocking”: centred side to side, centred top to bottom.',
  );
  await expect(artwork).toContainText('a drawing, so we can count its stitches straight away');

  // The server counts the drawing's stitches and adds the one-off setup.
  const stitching = price(page).getByRole('cell', { name: /^Your artwork: [\d,]+ stitches × 1 garment/ });
  await expect(stitching).toBeVisible();
  await expect(price(page).getByRole('cell', { name: 'Artwork setup: 1 design, once per order' })).toBeVisible();
  const before = await stitching.textContent();
  await page.screenshot({ path: 'test-results/screens/artwork-on-the-garment.png', fullPage: true });

  // Wider artwork has more stitches; the price follows.
  const width = artwork.getByRole('spinbutton', { name: 'Width in mm' });
  await width.fill('40');
  await width.press('Enter');
  await expect(artwork.getByRole('slider', { name: /^Width/ })).toHaveAttribute('aria-valuetext', /^40 mm/);
  await expect(price(page).getByRole('cell', { name: /^Your artwork: [\d,]+ stitches × 1 garment/ })).not.toHaveText(
    before!,
  );

  // The script in the file never ran: it was removed before the file was stored.
  expect(await page.title()).not.toBe('pwned');
});

test('when a parent matches a colour of their own for a name, then the nearest threads are offered by ΔE and one is chosen', async ({
  page,
}) => {
  await page.goto('/design/bishop-dress');
  await page.getByText('Add a name', { exact: true }).click();
  await page.getByRole('textbox', { name: 'Name or words' }).fill('Ada');
  await page.getByRole('button', { name: 'Add the name' }).click();
  const name = onTheGarment(page).getByRole('listitem').filter({ hasText: 'Name “Ada”' });

  await name.getByLabel('Match a colour of your own').fill('#3b5bdb');
  const matches = name.getByRole('list', { name: 'Our nearest threads to #3b5bdb:' });
  await expect(matches.getByRole('button')).toHaveCount(3);
  await expect(matches.getByRole('button').first()).toContainText(/ΔE \d+\.\d: /);
  await page.screenshot({ path: 'test-results/screens/thread-nearest-matches.png', fullPage: true });
  const nearest = matches.getByRole('button').first();
  const threadName = (await nearest.locator('.font-medium').textContent())!;
  await nearest.click();
  await expect(nearest).toHaveAttribute('aria-pressed', 'true');
  await expect(name.getByRole('radio', { name: threadName })).toBeChecked();
  await expect(name.getByRole('group', { name: `Thread colour: ${threadName}` })).toBeVisible();
  await expect(price(page).getByRole('cell', { name: /^Lettering “Ada”/ })).toBeVisible();
});

test('when a border goes round the bishop dress’s curved hem, then its repeats follow the curve, and one more or fewer says what it would do', async ({
  page,
}) => {
  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto('/design/bishop-dress');
  await page.getByText('Add a border', { exact: true }).click();
  await page.getByRole('radio', { name: /Daisy and leaf chain/ }).check({ force: true });
  await page.getByRole('button', { name: 'Add this border' }).click();
  const border = onTheGarment(page).getByRole('listitem').filter({ hasText: 'Border: Daisy and leaf chain' });
  // The trade's worked case (common practice, no source): 4 × 173 mm round the 692 mm hem; 5 would be 76.9 %, below 90 %.
  await expect(border.getByRole('button', { name: 'One fewer (3)' })).toBeDisabled();
  await expect(border).toContainText('5 repeats would need 76.9 %');
  await expect(border.getByRole('button', { name: 'One more (5)' })).toBeDisabled();
  await page.getByRole('group', { name: /^The bishop dress in size/ }).scrollIntoViewIfNeeded();
  await page.screenshot({ path: 'test-results/screens/border-on-curved-hem-phone.png' });
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
});
