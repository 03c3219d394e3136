import { expect, test, type Page } from '@playwright/test';

const onTheGarment = (page: Page) => page.getByRole('region', { name: 'On the garment' });
const canvas = (page: Page) => page.getByRole('group', { name: /^The bishop dress in size/ });
const overlapWarning = (page: Page) => page.getByRole('status', { name: 'Overlapping embroidery' });

/** Opens the motif drawer (it closes once a motif is added) and adds a sitting bunny at 80 %. */
async function addBunny(page: Page) {
  const add = page.getByRole('region', { name: 'Add to the garment' });
  await add.getByText('Add a motif', { exact: true }).click();
  await add.getByRole('radio', { name: /Sitting bunny/ }).check({ force: true });
  // 80 %: 28.8 mm wide, so two stand side by side in the 6-month chest's 91 mm.
  await add.getByRole('slider', { name: /Size/ }).fill('80');
  await add.getByRole('button', { name: 'Add this motif' }).click();
}

test('when two motifs are added to the same zone, then they do not overlap; dragged onto each other, the warning shows', async ({
  page,
}) => {
  await page.goto('/design/bishop-dress');
  await expect(page.getByRole('heading', { name: 'Design your bishop dress' })).toBeVisible();
  await addBunny(page);
  await addBunny(page);

  const items = onTheGarment(page).getByRole('listitem');
  await expect(items).toHaveCount(2);
  await expect(overlapWarning(page)).toBeEmpty();
  await expect(onTheGarment(page)).not.toContainText('Overlaps');

  // The second bunny (selected on adding) went into free space beside the first, which stays in the middle.
  const second = items.nth(1);
  const where = await second.getByRole('status').textContent();
  const match = /(\d+) mm (left|right) of centre, centred top to bottom/.exec(where ?? '');
  expect(match, `the second bunny's place: ${where}`).not.toBeNull();
  const offsetMm = Number(match![1]) * (match![2] === 'left' ? -1 : 1);
  expect(Math.abs(offsetMm)).toBeGreaterThanOrEqual(29);

  // Drag the second bunny onto the first. The 6-month mockup is 418.8 × 427.9 mm and the chest zone is centred at
  // (209.4, 104.7) mm (seeds/data/garments.ts).
  // Adding scrolls the garment into view smoothly: measure the canvas once it has stopped moving.
  const drawing = canvas(page).locator('canvas').last();
  await drawing.scrollIntoViewIfNeeded();
  let surface = await drawing.boundingBox();
  await expect
    .poll(async () => {
      const before = surface;
      surface = await drawing.boundingBox();
      return JSON.stringify(before) === JSON.stringify(surface);
    })
    .toBe(true);
  const at = (xMm: number, yMm: number) =>
    [surface!.x + (xMm / 418.83) * surface!.width, surface!.y + (yMm / 427.94) * surface!.height] as const;
  await page.mouse.move(...at(209.4 + offsetMm, 104.7));
  await page.mouse.down();
  for (const step of [0.3, 0.6, 0.9]) await page.mouse.move(...at(209.4 + offsetMm * (1 - step), 104.7));
  await page.mouse.move(...at(209.4 + 2, 104.7));
  await page.mouse.up();

  await expect(overlapWarning(page)).toContainText('Some of your embroidery overlaps');
  await expect(overlapWarning(page)).toContainText(/Sitting bunny and Sitting bunny overlap by \d+ mm/);
  // Next to the placements in the list too, on both of them.
  await expect(items.filter({ hasText: 'Overlaps Sitting bunny' })).toHaveCount(2);

  // Undo takes the drag back, and the warning goes.
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(overlapWarning(page)).toBeEmpty();
});
