import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';

/** axe-core's own impact scale: only these two block a page here; moderate and minor findings are listed, not failed. */
const BLOCKING = new Set(['serious', 'critical']);

async function blockingViolations(page: Page) {
  const { violations } = await new AxeBuilder({ page }).analyze();
  return violations
    .filter((violation) => BLOCKING.has(violation.impact ?? ''))
    .map((violation) => ({ rule: violation.id, impact: violation.impact, help: violation.help, targets: violation.nodes.map((node) => node.target.join(' ')) }));
}

const pages: { name: string; path: string; ready: (page: Page) => Promise<void> }[] = [
  {
    name: 'the catalogue (home)',
    path: '/',
    ready: (page) => expect(page.getByRole('region', { name: 'Borders, motifs and lettering' }).getByRole('heading', { name: 'Daisy and leaf chain' })).toBeVisible(),
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
];

for (const { name, path, ready } of pages) {
  for (const width of [1280, 390]) {
    test(`when axe checks ${name} at ${width} px, then it finds no serious or critical violations`, async ({ page }) => {
      await page.setViewportSize({ width, height: 900 });
      await page.goto(path);
      await ready(page);
      expect(await blockingViolations(page)).toEqual([]);
    });
  }
}
