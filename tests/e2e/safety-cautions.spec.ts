import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { expect, test, type Page } from '@playwright/test';
import { signInAs } from './support/sign-in.ts';

// Walks the garment pages, the designer, checkout, an order page and a production sheet: more than the usual 30 s.
test.describe.configure({ mode: 'serial', timeout: 90_000 });

/** Where the screenshots go: a folder the caller names, for a person to look at what a parent sees. */
const shotsDir = process.env.SAFETY_SHOTS_DIR ?? '/tmp/safety-shots';
mkdirSync(shotsDir, { recursive: true });
const shot = (page: Page, name: string) => page.screenshot({ path: join(shotsDir, `${name}.png`), fullPage: true });

const bonnetTies =
  'This garment ties under the chin with ribbons. Tie them in a bow, keep the loose ends short, and take the garment off before naps and sleep and whenever your child is not watched: anything tied round a child’s neck can catch and strangle.';
const bibSnap =
  'This garment fastens round the neck with a snap. Put it on only while your child is awake and watched, take it off before naps and sleep, and check the fastening holds each time.';
const deferral = 'Please follow the children’s product rules where you live.';

test('when a parent opens the sun bonnet and the terry bib, then each size shows its safety notes', async ({
  page,
}) => {
  await page.goto('/garments/sun-bonnet');
  const bonnetNotes = page.getByRole('region', { name: 'Safety notes for size 0–3 months' });
  await expect(bonnetNotes.getByText('Please take care: Ribbon ties under the chin')).toBeVisible();
  await expect(bonnetNotes.getByText(bonnetTies)).toBeVisible();
  await expect(bonnetNotes.getByText('Good to know: Secure thread ends')).toBeVisible();
  await expect(bonnetNotes.getByText(deferral)).toBeVisible();
  await shot(page, 'bonnet-garment-page');

  await page.goto('/garments/terry-bib');
  const bibNotes = page.getByRole('region', { name: 'Safety notes for size Small (0–6 months)' });
  await expect(bibNotes.getByText('Please take care: Fastens round the neck')).toBeVisible();
  await expect(bibNotes.getByText(bibSnap)).toBeVisible();
  await shot(page, 'bib-garment-page');
});

test('when Dominic opens his bonnet in the designer and at checkout, then the price panel shows the notes and paying waits for the tick', async ({
  page,
}) => {
  await page.goto('/garments/sun-bonnet');
  await signInAs(page, 'Dominic Lark');
  await page.goto('/design/sun-bonnet?design=10');
  const panelNotes = page
    .getByRole('region', { name: 'Your price' })
    .getByRole('region', { name: 'Safety notes for this size' });
  await expect(panelNotes.getByText('Please take care: Ribbon ties under the chin')).toBeVisible();
  await shot(page, 'bonnet-designer-price-panel');

  await page.goto('/checkout/10');
  const notes = page.getByRole('region', { name: 'Before you pay: safety notes for size 6–12 months' });
  await expect(notes.getByText(bonnetTies)).toBeVisible();
  const pay = page.getByRole('button', { name: 'Continue to payment' });
  await expect(pay).toBeDisabled();
  const tick = page.getByLabel('I have read these safety notes and will follow them for the child who wears it.');
  await tick.check();
  await expect(pay).toBeEnabled();
  await shot(page, 'bonnet-checkout');
  await tick.uncheck();
  await expect(pay).toBeDisabled();

  await page.goto('/orders/WB-1012');
  const orderNotes = page.getByRole('region', { name: 'Safety notes for Sun bonnet, size 6–12 months' });
  await expect(orderNotes.getByText(bonnetTies)).toBeVisible();
  await shot(page, 'bonnet-order-page');
});

test('when Harriet looks back at her bib order and the studio opens its production sheet, then both show the neck fastening', async ({
  page,
}) => {
  await page.goto('/orders');
  await signInAs(page, 'Harriet Okonkwo');
  await page.goto('/orders/WB-1001');
  const orderNotes = page.getByRole('region', { name: /^Safety notes for Terry bib, size Small/ });
  await expect(orderNotes.getByText(bibSnap)).toBeVisible();
  await shot(page, 'bib-order-proof');

  await page.context().clearCookies();
  await page.goto('/admin/orders/WB-1001/production');
  await signInAs(page, 'Tobias Fenwick', /sign in with google/i);
  await page.goto('/admin/orders/WB-1001/production');
  await expect(page.getByRole('heading', { name: 'Production sheet · WB-1001' })).toBeVisible();
  await expect(page.getByText(`Fastens round the neck: ${bibSnap}`)).toBeVisible();
  await shot(page, 'bib-production-sheet');
});
