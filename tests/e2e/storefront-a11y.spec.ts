import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { signInAs } from './support/sign-in.ts';

/** axe-core's own impact scale: only these two block a page here; moderate and minor findings are listed, not failed. */
const BLOCKING = new Set(['serious', 'critical']);

async function blockingViolations(page: Page) {
  const { violations } = await new AxeBuilder({ page }).analyze();
  return violations
    .filter((violation) => BLOCKING.has(violation.impact ?? ''))
    .map((violation) => ({
      rule: violation.id,
      impact: violation.impact,
      help: violation.help,
      targets: violation.nodes.map((node) => node.target.join(' ')),
    }));
}

const pages: { name: string; path: string; ready: (page: Page) => Promise<void> }[] = [
  {
    name: 'the catalogue (home)',
    path: '/',
    ready: (page) =>
      expect(
        page
          .getByRole('region', { name: 'Borders, motifs and lettering' })
          .getByRole('heading', { name: 'Daisy and leaf chain' }),
      ).toBeVisible(),
  },
  {
    name: 'a garment page',
    path: '/garments/bishop-dress',
    ready: (page) => expect(page.getByRole('img', { name: 'The bishop dress from the back' })).toBeVisible(),
  },
  {
    name: 'the design page',
    path: '/design/bishop-dress',
    ready: (page) => expect(page.getByRole('group', { name: /^The bishop dress in size/ })).toBeVisible(),
  },
  {
    name: 'a shared design',
    // Seeded as shared (seeds/data/designs.ts).
    path: '/shared/seed-share-theo-star-and-moon-4f7c2a9e',
    ready: (page) => expect(page.getByRole('img', { name: /drawn on the terry bib$/ })).toBeVisible(),
  },
];

for (const { name, path, ready } of pages) {
  for (const width of [1280, 390]) {
    test(`when axe checks ${name} at ${width} px, then it finds no serious or critical violations and nothing runs off the side`, async ({
      page,
    }) => {
      await page.setViewportSize({ width, height: 900 });
      await page.goto(path);
      await ready(page);
      expect(await blockingViolations(page)).toEqual([]);
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(width);
    });
  }
}

test('when axe checks My designs with a share link and a delete question open, then it finds no serious or critical violations', async ({
  page,
}) => {
  await page.goto('/designs');
  await signInAs(page, 'Priya Castellanos');
  const card = page
    .getByRole('listitem')
    .filter({ has: page.getByRole('heading', { name: "Clara's birthday dress" }) });
  await card.getByRole('button', { name: 'Share' }).click();
  await card.getByRole('button', { name: 'Make a share link' }).click();
  await expect(card.getByRole('textbox', { name: /Anyone with this link/ })).toBeVisible();
  await card.getByRole('button', { name: 'Delete' }).click();
  await expect(card.getByRole('button', { name: 'Keep it' })).toBeFocused();
  expect(await blockingViolations(page)).toEqual([]);
  await page.setViewportSize({ width: 390, height: 844 });
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  await page.screenshot({ path: 'test-results/screens/my-designs-phone.png', fullPage: true });
});
