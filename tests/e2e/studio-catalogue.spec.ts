import { readFileSync } from 'node:fs';
import { expect, test } from '@playwright/test';
import { signInAs } from './support/sign-in.ts';

test.describe.configure({ mode: 'serial' });

const tulipSvg = readFileSync(new URL('./fixtures/tulip-sprig.svg', import.meta.url));

test('when staff upload a motif SVG, then they see the sanitized drawing and the estimate, save it, and the shop offers it', async ({
  page,
}) => {
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.goto('/admin/catalogue');
  await signInAs(page, 'Tobias Fenwick', /sign in with google/i);
  await expect(page.getByRole('heading', { name: 'Catalogue', level: 1 })).toBeVisible();
  await expect(page.getByRole('heading', { name: 'Garments' })).toBeVisible();
  await page.screenshot({ path: 'test-results/screens/studio-catalogue.png', fullPage: true });

  await page.getByRole('button', { name: 'Add motif' }).click();
  const dialog = page.getByRole('dialog', { name: 'Add a motif' });
  await expect(dialog).toBeVisible();
  await dialog
    .getByLabel('Artwork (SVG)')
    .setInputFiles({ name: 'tulip-sprig.svg', mimeType: 'image/svg+xml', buffer: tulipSvg });

  const progress = dialog.getByRole('progressbar', { name: 'Artwork upload' });
  await expect(progress).toHaveAttribute('aria-valuenow', '100');
  await expect(dialog.getByText('Uploaded and measured')).toBeVisible();
  await expect(dialog.getByTestId('motif-estimate')).toContainText(/stitches estimated/);
  await expect(dialog.getByRole('img', { name: 'The motif as it will be kept' })).toBeVisible();
  // The size comes from the file's own millimetres; the name from the file name.
  await expect(dialog.getByLabel('Width at 100 % (mm)')).toHaveValue('40');
  await expect(dialog.getByLabel('Height at 100 % (mm)')).toHaveValue('50');
  await expect(dialog.getByLabel('Name', { exact: true })).toHaveValue('Tulip sprig');
  await expect(dialog.getByRole('combobox', { name: /Thread for colour/ })).toHaveCount(3);
  await expect(dialog.getByTestId('stitch-source')).toContainText('engine’s estimate');
  await page.screenshot({ path: 'test-results/screens/studio-motif-upload.png', fullPage: true });

  await dialog.getByRole('button', { name: 'Add motif' }).click();
  await expect(dialog).toBeHidden();
  const row = page.getByRole('row', { name: /Tulip sprig/ });
  await expect(row).toBeVisible();
  await expect(row).toContainText('estimated');

  const offered = await (await page.request.get('/api/catalogue/motifs')).json();
  const tulip = offered.motifs.find((motif: { slug: string }) => motif.slug === 'tulip-sprig');
  expect(tulip).toMatchObject({ name: 'Tulip sprig', kind: 'single', widthMm: 40, heightMm: 50, colourCount: 3 });
  expect(tulip.svg).not.toContain('script');
});

test('when staff retire a thread at phone width, then they confirm first and it is marked retired', async ({
  page,
}) => {
  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto('/admin/catalogue');
  await signInAs(page, 'Tobias Fenwick', /sign in with google/i);
  await expect(page.getByRole('heading', { name: 'Smocked yoke dress' })).toBeVisible();
  await page.screenshot({ path: 'test-results/screens/studio-catalogue-phone-garments.png' });
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  await page.getByRole('link', { name: 'Threads' }).click();
  const retire = page.getByRole('button', { name: /^Retire / }).last();
  const label = (await retire.getAttribute('aria-label'))!.replace(/^Retire /, '');
  await retire.click();
  await expect(page.getByText(`Hide “${label}” from customers?`)).toBeVisible();
  await page.getByRole('button', { name: 'Yes, retire it' }).click();
  await expect(page.getByRole('button', { name: `Bring back ${label}` })).toBeVisible();
  await page.screenshot({ path: 'test-results/screens/studio-catalogue-phone-threads.png' });
  await page.getByRole('button', { name: `Bring back ${label}` }).click();
  await page.getByRole('button', { name: 'Yes, bring it back' }).click();
  await expect(page.getByRole('button', { name: `Retire ${label}` })).toBeVisible();
});

test('when staff add a hoop under a short name already taken, then the server’s message shows beside that field, and a new name saves', async ({
  page,
}) => {
  await page.goto('/admin/catalogue#hoops');
  await signInAs(page, 'Tobias Fenwick', /sign in with google/i);
  await page.getByRole('button', { name: 'Add hoop' }).click();
  const dialog = page.getByRole('dialog', { name: 'Add a hoop' });
  await dialog.getByLabel('Name', { exact: true }).fill('Square 100');
  await dialog.getByLabel('Short name').fill('square-100');
  await dialog.getByLabel('Sewing field width (mm)').fill('0');
  await dialog.getByLabel('Sewing field height (mm)').fill('100');
  // A new hoop starts with the default clearance, and the drawing says what is left to sew in.
  await expect(dialog.getByLabel('Clearance at each edge (mm)')).toHaveValue('3');
  await dialog.getByRole('button', { name: 'Add hoop' }).click();
  // The contract checks in the browser first: a zero field never reaches the server.
  await expect(dialog.getByText('The field width must be more than 0 mm')).toBeVisible();
  await dialog.getByLabel('Sewing field width (mm)').fill('100');
  await expect(dialog.getByText(/94 mm .* × 94 mm .* to sew in/)).toBeVisible();
  await dialog.getByRole('button', { name: 'Add hoop' }).click();
  const shortName = dialog.getByLabel('Short name');
  await expect(shortName).toHaveAttribute('aria-invalid', 'true');
  await expect(dialog.getByText('Another hoop already uses this short name')).toBeVisible();
  await page.screenshot({ path: 'test-results/screens/studio-hoop-field-error.png' });
  await shortName.fill('square-100-spare');
  await dialog.getByRole('button', { name: 'Add hoop' }).click();
  await expect(dialog).toBeHidden();
  await expect(page.getByRole('button', { name: 'Edit Square 100', exact: true })).toBeVisible();
});
