import { expect, test } from '@playwright/test';
import { loadDatabaseConfig } from '../../server/src/config.ts';
import { openDatabase } from '../../server/src/db/knex.ts';
import { sendTestProof } from '../support/proof-fixtures.ts';
import { signInAs } from './support/sign-in.ts';

// WB-1007 is seeded with Priya's changes asked on proof 1 and is used by no other journey.
test('when Priya pins a note and approves, then she chooses to approve with it and the studio reads it on the sheet', async ({
  page,
  browser,
}) => {
  const db = openDatabase(loadDatabaseConfig());
  try {
    await sendTestProof(db, { orderNumber: 'WB-1007', message: 'Proof 2, with the changes you asked for.' });
    // Its seeded hold lapsed long ago on the real clock; the customer's page only reads how long it lasts.
    const order = await db('orders').where({ number: 'WB-1007' }).first('id');
    await db('payments')
      .where({ order_id: order.id, status: 'authorized' })
      .update({ capture_before: new Date(Date.now() + 6 * 86_400_000) });
  } finally {
    await db.destroy();
  }
  await page.goto('/orders/WB-1007');
  await signInAs(page, 'Priya Castellanos');
  const proof = page.getByRole('region', { name: 'Your proof' });
  await expect(proof).toContainText('Version 2 · Waiting for your answer');
  await expect(page.getByRole('region', { name: 'Payment' })).toContainText('We charge it once you approve');
  await proof.getByRole('button', { name: 'Add a pin' }).click();
  await proof.getByLabel('What should change at pin 1?').fill('Please use the pale pink thread for the name.');

  await proof.getByRole('button', { name: 'Approve this proof' }).click();
  const choice = proof.getByRole('group', { name: /You pinned a note to the picture/ });
  await expect(choice).toBeVisible();
  await expect(choice.getByRole('button', { name: 'Ask for changes and a new proof' })).toBeVisible();
  await page.screenshot({ path: 'test-results/screens/proof-approve-with-notes.png', fullPage: true });
  await choice.getByRole('button', { name: 'Approve with this note' }).click();

  await expect(proof).toContainText('You approved this one');
  await expect(proof).toContainText('Please use the pale pink thread for the name.');
  const payment = page.getByRole('region', { name: 'Payment' });
  await expect(payment).toContainText('You have approved your proof');
  await expect(payment).not.toContainText('once you approve');

  const studio = await (await browser.newContext()).newPage();
  await studio.goto('/admin/orders/WB-1007/production');
  await signInAs(studio, 'Tobias Fenwick', /sign in with google/i);
  const notes = studio.getByRole('region', { name: 'Customer notes on the approved proof 2' });
  await expect(notes).toContainText('Please use the pale pink thread for the name.');
});
