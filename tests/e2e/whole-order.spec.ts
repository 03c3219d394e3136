import { readFileSync } from 'node:fs';
import { expect, test, type Browser, type Page } from '@playwright/test';
import { signInAs } from './support/sign-in.ts';

/**
 * One order from both sides, through the apps alone: Harriet designs and pays in the storefront; the studio finds
 * the order on its board and sends a drawn proof; Harriet approves it on her order page; the studio approves and
 * charges, and prints the production sheet with its hooping plan.
 */
test.describe.configure({ mode: 'serial', timeout: 120_000 });

const shots = (name: string) => `test-results/screens/whole-order-${name}.png`;
const neededBy = new Date(Date.now() + 30 * 86_400_000).toISOString().slice(0, 10);

async function personPage(browser: Browser, path: string, person: string, startLink?: RegExp): Promise<Page> {
  const page = await (await browser.newContext()).newPage();
  await page.goto(path);
  await signInAs(page, person, startLink);
  return page;
}

test('when a grandparent orders a bordered dress, then the studio proofs it, she approves, and the studio charges and prints the sheet', async ({
  browser,
}) => {
  // The storefront: a daisy border all the way round the 6-month bishop dress and a name, saved and ordered.
  const harriet = await personPage(browser, '/design/bishop-dress', 'Harriet');
  await harriet.getByText('Add a border', { exact: true }).click();
  await harriet.getByRole('radio', { name: /All the way round/ }).check({ force: true });
  await harriet.getByRole('radio', { name: /Daisy and leaf chain/ }).check({ force: true });
  await harriet.getByRole('button', { name: 'Add this border' }).click();
  // 692 mm round the hem holds 4 repeats resized to 173 mm (common practice, no source: the trade's worked case).
  await expect(harriet.getByRole('region', { name: 'On the garment' })).toContainText('4 repeats all the way round');
  await harriet.getByText('Add a name', { exact: true }).click();
  await harriet.getByRole('textbox', { name: 'Name or words' }).fill('Maisie');
  await harriet.getByRole('button', { name: 'Add the name' }).click();
  await expect(
    harriet.getByRole('region', { name: 'Your price' }).getByRole('cell', { name: /^Lettering “Maisie”/ }),
  ).toBeVisible();
  await harriet.getByRole('textbox', { name: 'Name this design' }).fill('Maisie’s daisy dress');
  await harriet.getByRole('button', { name: 'Save and order' }).click();

  await expect(harriet.getByRole('heading', { name: 'Order “Maisie’s daisy dress”' })).toBeVisible();
  await harriet.getByLabel('Needed by').fill(neededBy);
  await harriet.getByLabel('Name', { exact: true }).fill('Harriet Oakes');
  await harriet.getByLabel('Street address').fill('7 Wrenfield Row');
  await harriet.getByLabel('Town or city').fill('Millbrook');
  await harriet.getByLabel('State, county or region').fill('VT');
  await harriet.getByLabel('Postal code').fill('05000');
  await harriet.getByRole('button', { name: 'Continue to payment' }).click();
  await expect(harriet.getByRole('heading', { name: /^(Pay \$|Save your card)/ })).toBeVisible();
  await harriet.getByLabel('Card number').fill('4242 4242 4242 4242');
  await harriet.getByLabel('Expiry (MM/YY)').fill('12/30');
  await harriet.getByLabel('CVC').fill('123');
  await harriet.getByLabel('Name on card').fill('Harriet Oakes');
  await harriet.getByRole('button', { name: /^(Pay \$|Save your card)/ }).click();
  await expect(harriet).toHaveURL(/\/orders\/WB-\d+\?checkout=done$/);
  const number = /WB-\d+/.exec(harriet.url())![0];
  await expect(harriet.getByText('Proof on its way')).toBeVisible();

  // The studio: the new order is on the board with a proof to send; the server draws the proof.
  const tobias = await personPage(browser, '/admin/orders', 'Tobias Fenwick', /sign in with google/i);
  await tobias.getByRole('searchbox').fill(number);
  const row = tobias.getByRole('table').getByRole('link', { name: number });
  await expect(row).toBeVisible();
  await row.click();
  await expect(tobias.getByRole('heading', { name: `Order ${number}` })).toBeVisible();
  await tobias
    .getByLabel('Note to the customer')
    .fill('Here is Maisie’s dress, drawn to scale with the daisies round the hem.');
  await tobias.getByRole('button', { name: 'Send proof' }).click();
  await expect(tobias.getByRole('status').filter({ hasText: 'Proof 1 is on its way' })).toBeVisible({
    timeout: 30_000,
  });
  await tobias.screenshot({ path: shots('proof-sent'), fullPage: true });

  // The customer: the proof is on her order page; she approves it.
  await harriet.goto(`/orders/${number}`);
  await expect(harriet.getByText('Proof ready for you')).toBeVisible();
  await harriet.getByRole('region', { name: 'Your proof' }).getByRole('button', { name: 'Approve this proof' }).click();
  await expect(harriet.getByText('Approved, about to start')).toBeVisible();
  await harriet.screenshot({ path: shots('approved'), fullPage: true });

  // The studio: approve & charge captures the held card once; the production sheet shows the hooping plan.
  await tobias.reload();
  await tobias.getByRole('button', { name: /Approve & charge/ }).click();
  await tobias.getByRole('button', { name: 'Charge the card' }).click();
  await expect(tobias.getByText('Card charged')).toBeVisible();
  await tobias.getByRole('link', { name: 'Production sheet' }).click();
  await expect(tobias.getByRole('heading', { name: `Production sheet · ${number}` })).toBeVisible();
  await expect(tobias.getByRole('heading', { name: /Hooping plan · Hem border: Daisy and leaf chain/ })).toBeVisible();
  await expect(tobias.getByTestId('hooping-plan-picture')).toHaveAttribute('aria-label', /hooping 4 holds repeat/);
  await tobias.screenshot({ path: shots('production-sheet'), fullPage: true });
  const download = tobias.waitForEvent('download');
  await tobias.getByRole('link', { name: 'Download PDF' }).click();
  const bytes = readFileSync((await (await download).path())!);
  expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
});
