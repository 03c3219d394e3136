import { expect, test, type Page } from '@playwright/test';
import { signInAs } from './support/sign-in.ts';

const screens = (name: string) => `test-results/screens/${name}.png`;
const embroidery = (page: Page) => page.getByRole('region', { name: 'Borders, motifs and lettering' });
const section = (page: Page, name: RegExp) => embroidery(page).getByRole('region', { name });
/** Taps the kind's chip (the visible label of its radio), as a finger would. */
async function chooseKind(page: Page, kind: string) {
  await embroidery(page)
    .getByRole('search', { name: 'Filter the embroidery' })
    .getByText(kind, { exact: true })
    .click();
  await expect(embroidery(page).getByRole('radio', { name: kind })).toBeChecked();
}

test('when a parent filters the embroidery by garment and kind, then the address keeps the filter and the fonts show in their own face', async ({
  page,
}) => {
  await page.goto('/');
  await expect(section(page, /^Borders/).getByRole('heading', { name: 'Daisy and leaf chain' })).toBeVisible();
  await expect(section(page, /^Single motifs/).getByRole('heading', { name: 'Sitting bunny' })).toBeVisible();
  // Finished size and stitch count, from the catalogue (seeds/data/motifs.ts: 460 + 3,420 + 500 stitches).
  const daisy = section(page, /^Borders/)
    .getByRole('listitem')
    .filter({ hasText: 'Daisy and leaf chain' });
  await expect(daisy).toContainText('180 mm · 7 ¹⁄₁₆ in wide × 40 mm · 1 ⁹⁄₁₆ in tall');
  await expect(daisy).toContainText('about 4,380 in 3 thread colours');

  // A bib has no hem: no border suits it, and the empty section says so and offers the way back.
  await embroidery(page).getByRole('combobox', { name: 'For the garment' }).selectOption({ label: 'Terry bib' });
  await expect(page).toHaveURL(/\?garment=terry-bib$/);
  await expect(section(page, /^Borders/)).toContainText('No borders suit the terry bib.');
  await chooseKind(page, 'Single motifs');
  await expect(page).toHaveURL(/\?garment=terry-bib&kind=single$/);
  await expect(section(page, /^Borders/)).toHaveCount(0);
  await expect(
    section(page, /^Single motifs/)
      .getByRole('listitem')
      .first(),
  ).toBeVisible();
  await page.screenshot({ path: screens('catalogue-bib-single-motifs'), fullPage: true });

  // The filter lives in the address: a reload or a shared link shows the same.
  await page.goto('/?garment=bishop-dress&kind=lettering');
  await expect(embroidery(page).getByRole('combobox', { name: 'For the garment' })).toHaveValue('bishop-dress');
  await expect(embroidery(page).getByRole('radio', { name: 'Lettering' })).toBeChecked();
  const lettering = section(page, /^Lettering/);
  await lettering.getByRole('textbox', { name: 'Try a name' }).fill('Theodora');
  const sample = lettering.getByRole('listitem').filter({ hasText: 'Breezy Script' }).getByText('Theodora');
  await expect(sample).toHaveCSS('font-family', /Pacifico/);
  // The browser fetches each face because text is set in it here; the retired font's face is declared but never fetched.
  const loadedFamilies = () =>
    page.evaluate(() =>
      [...document.fonts].filter((face) => face.status === 'loaded').map((face) => face.family.replaceAll('"', '')),
    );
  await expect.poll(loadedFamilies).toEqual(expect.arrayContaining(['Pacifico', 'Fredoka', 'Playfair Display']));
  expect(await loadedFamilies()).not.toContain('Great Vibes');
  await page.screenshot({ path: screens('catalogue-lettering'), fullPage: true });

  await chooseKind(page, 'Everything');
  await embroidery(page).getByRole('combobox', { name: 'For the garment' }).selectOption({ label: 'Any garment' });
  await expect(page).toHaveURL(/\/$/);
});

test('when a parent opens a garment, then it shows from the front and the back, with every size measured in mm and inches', async ({
  page,
}) => {
  await page.goto('/');
  await page
    .getByRole('link')
    .filter({ hasText: /bishop dress/i })
    .first()
    .click();
  await expect(page.getByRole('heading', { name: 'Bishop dress', level: 1 })).toBeVisible();
  for (const side of ['front', 'back']) {
    const view = page.getByRole('img', { name: `The bishop dress from the ${side}` });
    await expect(view).toBeVisible();
    expect(await view.evaluate((image: HTMLImageElement) => image.naturalWidth)).toBeGreaterThan(0);
  }
  const sizes = page.getByRole('region', { name: 'Sizes of the bishop dress' });
  await expect(sizes.getByRole('row', { name: /^6 months \(chosen\)/ })).toContainText('470 mm · 18 ¹⁄₂ in');
  await page.getByRole('radio', { name: '2T' }).check({ force: true });
  await expect(sizes.getByRole('row', { name: /^2T \(chosen\)/ })).toContainText('880 mm · 34 ⁵⁄₈ in');
  await expect(
    page.getByRole('region', { name: 'Single motifs that suit it' }).getByRole('heading', { name: 'Sitting bunny' }),
  ).toBeVisible();
  await page.screenshot({ path: screens('garment-front-and-back'), fullPage: true });

  // At phone width the views sit side by side and nothing runs off the side (the size table scrolls in its box).
  await page.setViewportSize({ width: 390, height: 844 });
  await expect(page.getByRole('img', { name: 'The bishop dress from the back' })).toBeVisible();
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  await page.screenshot({ path: screens('garment-phone'), fullPage: true });
});

test('when a parent saves a design, then they duplicate it, share a link, and the link opens read-only for someone signed out', async ({
  page,
}) => {
  await page.goto('/design/bishop-dress');
  await page.getByText('Add a name', { exact: true }).click();
  await page.getByRole('textbox', { name: 'Name or words' }).fill('Wren');
  await page.getByRole('button', { name: 'Add the name' }).click();
  // Saving needs an account: the design waits in the tab while the visitor signs in and comes back to it.
  await signInAs(page, 'Priya Castellanos', /sign in to save/i);
  await expect(
    page.getByRole('region', { name: 'On the garment' }).getByRole('button', { name: /^Name “Wren”/ }),
  ).toBeVisible();
  await page.getByRole('textbox', { name: 'Name this design' }).fill('Wren for the photos');
  await page.getByRole('button', { name: 'Save design' }).click();
  await expect(page.getByRole('region', { name: 'Keep this design' }).getByRole('status')).toHaveText('✓ Saved');

  await page.getByRole('link', { name: 'My designs' }).click();
  await expect(page.getByRole('heading', { name: 'My designs', level: 1 })).toBeVisible();
  const card = (name: string) =>
    page.getByRole('listitem').filter({ has: page.getByRole('heading', { name, exact: true }) });
  await expect(
    card('Wren for the photos').getByRole('img', { name: 'Wren for the photos on the bishop dress' }),
  ).toBeVisible();

  await card('Wren for the photos').getByRole('button', { name: 'Duplicate' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'Copied as “Wren for the photos (copy)”' })).toBeVisible();
  const copy = card('Wren for the photos (copy)');
  await copy.getByRole('button', { name: 'Rename' }).click();
  await copy.getByRole('textbox', { name: 'New name' }).fill('Wren in sage');
  await copy.getByRole('button', { name: 'Save the name' }).click();
  const renamed = card('Wren in sage');
  await renamed.getByRole('button', { name: 'Share' }).click();
  await renamed.getByRole('button', { name: 'Make a share link' }).click();
  const linkField = renamed.getByRole('textbox', { name: /Anyone with this link can look/ });
  await expect(linkField).toHaveValue(/\/shared\/[A-Za-z0-9_-]{24}$/);
  const link = await linkField.inputValue();
  await page.screenshot({ path: screens('my-designs'), fullPage: true });

  // A design in an order is kept; the page says why and what to do instead.
  const ordered = card("Mae's bunny bib");
  await ordered.getByRole('button', { name: 'Delete' }).click();
  await ordered.getByRole('button', { name: 'Yes, delete it' }).click();
  await expect(ordered.getByRole('alert')).toContainText(/part of order WB-\d+, so it is kept/);
  await expect(ordered.getByRole('alert')).toContainText('make a copy and change that');

  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page.getByRole('banner').getByRole('link', { name: 'Sign in' })).toBeVisible();
  await page.goto(link);
  await expect(page.getByRole('heading', { name: 'Wren in sage', level: 1 })).toBeVisible();
  await expect(page.getByRole('img', { name: 'Wren in sage, drawn on the bishop dress' })).toBeVisible();
  await expect(page.getByRole('listitem').filter({ hasText: 'Name “Wren” in' })).toBeVisible();
  await expect(page.locator('body')).not.toContainText('Priya');
  await expect(page.locator('canvas')).toHaveCount(0);
  await page.screenshot({ path: screens('shared-design-signed-out'), fullPage: true });
  await page.getByRole('link', { name: 'Design your own bishop dress' }).click();
  await expect(page.getByRole('heading', { name: 'Design your bishop dress' })).toBeVisible();
});
