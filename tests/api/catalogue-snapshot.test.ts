/**
 * Each server keeps the catalogue, the shop's settings and the published prices in memory. A studio edit must
 * still reach the very next quote on the instance that took the edit, and another instance sharing the database
 * within its re-check window (CATALOGUE_RECHECK_MS, 500 ms by default).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type { Express } from 'express';
import { quotePreviewResponse } from '../../server/src/contracts/quotes.ts';
import type { ShopSettings } from '../../server/src/contracts/admin-settings.ts';
import { daisyDressQuote } from '../support/sample-designs.ts';
import { startAnotherApp, useApiHarness, type ApiAgent } from '../support/api-harness.ts';

// The shop's default re-check window, as a server runs it.
const harness = useApiHarness({ env: { CATALOGUE_RECHECK_MS: '500' } });

/** A second server over the same database, with its own pool, sessions and in-memory catalogue. */
let other: { app: Express; close(): Promise<void> };
let owner: ApiAgent;
beforeAll(async () => {
  other = await startAnotherApp(harness.config);
  owner = harness.agent();
  await harness.signIn(owner, 'marigold@wrenandbobbin.test');
});
afterAll(async () => {
  await other?.close();
});

const previewOn = (app: Express) =>
  request(app).post('/api/quotes/preview').set('Origin', harness.config.appOrigin).send(daisyDressQuote);
const runMinutesOn = async (app: Express) =>
  quotePreviewResponse.parse((await previewOn(app).expect(200)).body).runMinutes.totalMinutes;
/** Another instance sees an edit within its re-check window: asked again for up to 2 s, never a stale answer after. */
const soon = { timeout: 2_000, interval: 100 };

describe('the catalogue kept in memory', () => {
  it('when the owner slows the machine, then the next quote on this server and on another runs longer', async () => {
    // Both servers have priced once, so both hold the catalogue in memory before the edit.
    const before = await runMinutesOn(harness.app);
    expect(await runMinutesOn(other.app)).toBe(before);
    const settings: ShopSettings = (await owner.get('/api/admin/settings').expect(200)).body.settings;

    await owner
      .put('/api/admin/settings')
      .send({ ...settings, setupMinutes: settings.setupMinutes + 30 })
      .expect(200);

    expect(await runMinutesOn(harness.app)).toBeCloseTo(before + 30, 6);
    await expect.poll(() => runMinutesOn(other.app), soon).toBeCloseTo(before + 30, 6);
    await owner.put('/api/admin/settings').send(settings).expect(200);
    expect(await runMinutesOn(harness.app)).toBeCloseTo(before, 6);
    await expect.poll(() => runMinutesOn(other.app), soon).toBeCloseTo(before, 6);
  });

  it('when the studio retires the border motif, then the next quote on either server refuses it, and takes it once it is back', async () => {
    const { id } = await harness.db('motifs').where({ slug: 'daisy-chain' }).first('id');
    await previewOn(other.app).expect(200);

    await owner.post(`/api/admin/catalogue/motifs/${id}/retire`).expect(200);
    const refused = await previewOn(harness.app).expect(400);
    expect(JSON.stringify(refused.body)).toContain('daisy-chain');
    await expect.poll(async () => (await previewOn(other.app)).status, soon).toBe(400);
    expect(JSON.stringify((await previewOn(other.app)).body)).toContain('daisy-chain');

    await owner.post(`/api/admin/catalogue/motifs/${id}/reactivate`).expect(200);
    await previewOn(harness.app).expect(200);
    await expect.poll(async () => (await previewOn(other.app)).status, soon).toBe(200);
  });

  it('when a price list is changed straight in the database, then the next quote uses it', async () => {
    const before = quotePreviewResponse.parse((await previewOn(other.app).expect(200)).body).quote.totalCents;
    const published = await harness.db('pricing_rule_sets').where({ status: 'published' }).first('id', 'rules');
    const rules = typeof published.rules === 'string' ? JSON.parse(published.rules) : published.rules;
    await harness
      .db('pricing_rule_sets')
      .where({ id: published.id })
      .update({ rules: JSON.stringify({ ...rules, centsPerThousandStitches: rules.centsPerThousandStitches * 2 }) });
    try {
      const totalOn = async () =>
        quotePreviewResponse.parse((await previewOn(other.app).expect(200)).body).quote.totalCents;
      await expect.poll(totalOn, soon).toBeGreaterThan(before);
    } finally {
      await harness
        .db('pricing_rule_sets')
        .where({ id: published.id })
        .update({ rules: JSON.stringify(rules) });
    }
  });
});
