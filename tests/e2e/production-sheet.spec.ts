import { readFileSync } from 'node:fs';
import AxeBuilder from '@axe-core/playwright';
import { expect, test } from '@playwright/test';
import { signInAs } from './support/sign-in.ts';
import { readPdfPages } from '../support/pdf-geometry.ts';

test('when staff open an approved order’s production sheet, then they see the hooping plan and the PDF downloads', async ({
  page,
}) => {
  // One journey with an accessibility audit, a download and a print: slow on a shared two-core machine.
  test.setTimeout(90_000);
  await page.goto('/admin/orders/WB-1013');
  await signInAs(page, 'Tobias Fenwick', /sign in with google/i);
  await expect(page.getByRole('heading', { name: 'Order WB-1013' })).toBeVisible();
  await page.getByRole('link', { name: 'Production sheet' }).click();

  await expect(page.getByRole('heading', { name: 'Production sheet · WB-1013' })).toBeVisible();
  await expect(page.getByRole('heading', { name: /Hooping plan · Hem border: Daisy and leaf chain/ })).toBeVisible();
  const picture = page.getByTestId('hooping-plan-picture');
  await expect(picture).toBeVisible();
  await expect(picture).toHaveAttribute('aria-label', /hooping 1 holds repeat 2/);
  await expect(page.getByText(/86\.5 mm \(3 ³⁄₈ in\) left of the centre mark/)).toBeVisible();
  // Issue 11: the stitching order's rule and the hoop's clearance, in words, for the 4 hoopings of the worked case.
  await expect(page.getByText(/From left to right the hoopings are numbered 3, 1, 2, 4\./)).toBeVisible();
  await expect(
    page.getByText(/Planned with 3 mm kept clear inside the sewing field at every edge \(114 × 174 mm/).first(),
  ).toBeVisible();
  await expect(page.getByText('WB-118').first()).toBeVisible();
  await page.screenshot({ path: 'test-results/screens/production-sheet.png', fullPage: true });
  const audit = await new AxeBuilder({ page }).include('main').analyze();
  expect(
    audit.violations.map(
      (violation) => `${violation.id}: ${violation.nodes.map((node) => node.target.join(' ')).join(', ')}`,
    ),
  ).toEqual([]);

  // The template is drawn at true size: its SVG is sized in CSS millimetres, 173 mm repeat inside a 188 mm template.
  const template = page.getByRole('img', { name: /one repeat per hooping, at true size/ });
  await expect(template).toHaveAttribute('width', '188mm');

  await page.getByText('A4', { exact: true }).click();
  const download = page.waitForEvent('download');
  await page.getByRole('link', { name: 'Download PDF' }).click();
  const file = await download;
  expect(file.suggestedFilename()).toBe('production-sheet-WB-1013-a4.pdf');
  const bytes = readFileSync((await file.path())!);
  expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');

  // Printing the page itself: the print CSS asks for the chosen paper through a named @page.
  const printed = await readPdfPages(
    await page.pdf({
      path: 'test-results/screens/production-sheet-printed.pdf',
      preferCSSPageSize: true,
      printBackground: true,
    }),
  );
  expect(printed.length).toBeGreaterThanOrEqual(3);
  // A4 is 595.28 × 841.89 PDF units (ISO 216; ISO 32000-1 §8.3.2.3); Chromium rounds its page box slightly.
  expect(Math.abs(printed[0].view[2] - 595.28)).toBeLessThan(1);
  expect(Math.abs(printed[0].view[3] - 841.89)).toBeLessThan(1);

  await page.setViewportSize({ width: 390, height: 844 });
  await expect(page.getByRole('link', { name: 'Download PDF' })).toBeVisible();
  await page.screenshot({ path: 'test-results/screens/production-sheet-phone.png', fullPage: true });
});

test('when the proof is not approved yet, then the page says why instead of a sheet', async ({ page }) => {
  await page.goto('/admin/orders/WB-1008/production');
  await signInAs(page, 'Tobias Fenwick', /sign in with google/i);
  await expect(page.getByRole('alert')).toContainText('proof waiting for the customer’s answer');
  await page.screenshot({ path: 'test-results/screens/production-sheet-not-approved.png' });
});
