import { beforeAll, describe, expect, it } from 'vitest';
import { shopSettings } from '../../seeds/data/shop.ts';
import { shippingRatesOfRow } from '../../server/src/db/shipping-rates-columns.ts';
import {
  pricingPreviewResponse,
  ruleSetDetailResponse,
  ruleSetListResponse,
  type PricingRules,
} from '../../server/src/contracts/admin-pricing.ts';
import { quotePreviewResponse } from '../../server/src/contracts/quotes.ts';
import { priceQuote, type PricingRuleSet, type QuotePlacement } from '../../server/src/engine/index.ts';
import { daisyDressQuote } from '../support/sample-designs.ts';
import { useApiHarness, type ApiAgent } from '../support/api-harness.ts';

const harness = useApiHarness();
let owner: ApiAgent;
let staff: ApiAgent;
let customer: ApiAgent;
beforeAll(async () => {
  owner = harness.agent();
  staff = harness.agent();
  customer = harness.agent();
  await harness.signIn(owner, 'marigold@wrenandbobbin.test');
  await harness.signIn(staff, 'tobias@wrenandbobbin.test');
  await harness.signIn(customer, 'priya@example.test');
});

const draftId = 2;
const draftRules = async (): Promise<PricingRules> =>
  ruleSetDetailResponse.parse((await owner.get(`/api/admin/pricing/${draftId}`).expect(200)).body).ruleSet.rules;

describe('who may use /api/admin/pricing', () => {
  it('when a customer asks for any pricing route, then each answers 403', async () => {
    await customer.get('/api/admin/pricing').expect(403);
    await customer.get(`/api/admin/pricing/${draftId}`).expect(403);
    await customer
      .post('/api/admin/pricing/preview')
      .send({ rules: await draftRules() })
      .expect(403);
    await customer
      .put(`/api/admin/pricing/${draftId}`)
      .send({ rules: await draftRules(), notes: null })
      .expect(403);
    await customer.post(`/api/admin/pricing/${draftId}/publish`).expect(403);
    await customer.post('/api/admin/pricing/drafts').expect(403);
  });

  it('when staff read the price lists, then they see them but may not edit; changing, publishing or starting one is refused naming the owner', async () => {
    const list = ruleSetListResponse.parse((await staff.get('/api/admin/pricing').expect(200)).body);
    expect(list.canEdit).toBe(false);
    await staff
      .post('/api/admin/pricing/preview')
      .send({ rules: await draftRules() })
      .expect(200);
    const put = await staff
      .put(`/api/admin/pricing/${draftId}`)
      .send({ rules: await draftRules(), notes: null })
      .expect(403);
    expect(put.body.error.message).toBe('Only the studio owner can change the price list.');
    expect((await staff.post(`/api/admin/pricing/${draftId}/publish`).expect(403)).body.error.message).toBe(
      'Only the studio owner can publish a price list.',
    );
    await staff.post('/api/admin/pricing/drafts').expect(403);
  });
});

describe('GET /api/admin/pricing', () => {
  it('when the owner lists the price lists, then the seeded v2 draft and v1 published come newest first with their quote counts', async () => {
    const list = ruleSetListResponse.parse((await owner.get('/api/admin/pricing').expect(200)).body);
    expect(list.canEdit).toBe(true);
    expect(list.ruleSets.map((r) => [r.version, r.status])).toEqual([
      [2, 'draft'],
      [1, 'published'],
    ]);
    expect(list.ruleSets[1].quoteCount).toBe(15);
    expect(list.ruleSets[1].publishedAt).toBe('2026-11-01T16:00:00.000Z');
  });

  it('when a price list does not exist or the id is not a number, then it answers 404 or 400', async () => {
    await owner.get('/api/admin/pricing/99').expect(404);
    expect((await owner.get('/api/admin/pricing/two').expect(400)).body.error.fields.id).toMatch(/price list id/);
  });
});

describe('PUT /api/admin/pricing/:id', () => {
  it('when the owner saves a negative stitch rate and a tax over 50 %, then it answers 400 with a message per field', async () => {
    const rules = { ...(await draftRules()), centsPerThousandStitches: -5, taxRateBp: 9000 };
    const res = await owner.put(`/api/admin/pricing/${draftId}`).send({ rules, notes: null }).expect(400);
    expect(res.body.error.fields['rules.centsPerThousandStitches']).toBe("The stitch rate can't be negative");
    expect(res.body.error.fields['rules.taxRateBp']).toMatch(/at most 50 %/);
  });

  it('when a blank price is fractional, then the field under garmentBaseCents is named', async () => {
    const rules = await draftRules();
    rules.garmentBaseCents['bishop-dress']!['6m'] = 38.5;
    const res = await owner.put(`/api/admin/pricing/${draftId}`).send({ rules, notes: null }).expect(400);
    expect(res.body.error.fields['rules.garmentBaseCents.bishop-dress.6m']).toMatch(/whole cents/);
  });

  it('when the owner saves a changed draft, then it keeps its version and the change reads back', async () => {
    const rules = { ...(await draftRules()), colorChangeCents: 75 };
    const saved = ruleSetDetailResponse.parse(
      (await owner.put(`/api/admin/pricing/${draftId}`).send({ rules, notes: 'Thread changes 0.75.' }).expect(200))
        .body,
    );
    expect(saved.ruleSet).toMatchObject({ version: 2, status: 'draft', notes: 'Thread changes 0.75.' });
    expect(saved.ruleSet.rules.colorChangeCents).toBe(75);
  });

  it('when the owner tries to change the published list, then it answers 409 and says to start a draft', async () => {
    const res = await owner
      .put('/api/admin/pricing/1')
      .send({ rules: await draftRules(), notes: null })
      .expect(409);
    expect(res.body.error.message).toMatch(/only a draft can be changed/);
  });
});

describe('POST /api/admin/pricing/preview', () => {
  it('when the draft is previewed, then three stored quotes come back and every figure equals priceQuote run directly on their saved inputs', async () => {
    const rules = await draftRules();
    const body = pricingPreviewResponse.parse(
      (await owner.post('/api/admin/pricing/preview').send({ rules }).expect(200)).body,
    );
    expect(body.samples.map((s) => s.role)).toEqual(['Smallest', 'Typical', 'Largest']);
    const published = (await harness.db('pricing_rule_sets').where({ status: 'published' }).first())
      .rules as PricingRuleSet;
    for (const sample of body.samples) {
      const row = await harness.db('quotes').where({ id: sample.quoteId }).first();
      const input = row.input as {
        garment: string;
        sizeCode: string;
        quantity: number;
        isRush: boolean;
        placements: QuotePlacement[];
        shipping?: { method: 'delivery' | 'pickup' };
      };
      const size = await harness
        .db('garment_sizes as s')
        .join('garments as g', 'g.id', 's.garment_id')
        .where({ 'g.slug': input.garment, 's.code': input.sizeCode })
        .first('g.name', 's.label');
      const direct = (ruleSet: PricingRuleSet) =>
        priceQuote({
          ruleSet,
          garment: { slug: input.garment, name: size.name },
          sizeCode: input.sizeCode,
          sizeLabel: size.label,
          quantity: input.quantity,
          placements: input.placements,
          isRush: input.isRush,
          // Priced to ship as the quote was, at the seeded rates.
          ...(input.shipping
            ? { shipping: { rates: shippingRatesOfRow(shopSettings), method: input.shipping.method } }
            : {}),
        });
      const before = direct(published);
      const after = direct({ ...rules, version: 2 });
      if (!before.ok || !after.ok || !sample.published.ok || !sample.draft.ok)
        throw new Error('a sample failed to price');
      // The published side is also what the quote was stored at, as it was priced with v1.
      expect(sample.published.totalCents).toBe(Number(row.total_cents));
      expect(sample.published.totalCents).toBe(before.totalCents);
      expect(sample.draft.totalCents).toBe(after.totalCents);
      expect(sample.draft.lines).toEqual(
        after.lines.map(({ code, label, amountCents }) => ({ code, label, amountCents })),
      );
      expect(sample.differenceCents).toBe(after.totalCents - before.totalCents);
    }
    // The draft raises the stitch rate and re-hooping, so no sample gets cheaper (the largest is a 3-garment job).
    expect(body.samples.every((s) => (s.differenceCents ?? 0) >= 0)).toBe(true);
    expect(
      body.samples[0].published.ok &&
        body.samples[2].published.ok &&
        body.samples[0].published.totalCents <= body.samples[2].published.totalCents,
    ).toBe(true);
  });

  it('when the rules fail the engine check, then the preview answers 400 rather than pricing with them', async () => {
    const rules = { ...(await draftRules()), currency: 'usd' };
    const res = await owner.post('/api/admin/pricing/preview').send({ rules }).expect(400);
    expect(res.body.error.fields['rules.currency']).toMatch(/three-letter/);
  });

  it('when a draft drops the price of a garment a sample uses, then that sample says why it cannot be priced instead of failing the preview', async () => {
    const rules = await draftRules();
    const body = pricingPreviewResponse.parse(
      (
        await owner
          .post('/api/admin/pricing/preview')
          .send({ rules: { ...rules, garmentBaseCents: {} } })
          .expect(200)
      ).body,
    );
    expect(body.samples.every((s) => !s.draft.ok && s.differenceCents === null)).toBe(true);
    expect(body.samples[0].draft.ok ? '' : body.samples[0].draft.reason).toMatch(/has no price for the/);
  });
});

describe('POST /api/admin/pricing/:id/publish and /drafts', () => {
  it('when a draft already exists, then starting another answers 409', async () => {
    expect((await owner.post('/api/admin/pricing/drafts').expect(409)).body.error.message).toMatch(
      /Version 2 is already a draft/,
    );
  });

  it('when the owner publishes the draft, then it is the only published list, old quotes keep version 1 and new quotes are priced with version 2', async () => {
    const before = await quoteRuleSetIds();
    const published = ruleSetDetailResponse.parse(
      (await owner.post(`/api/admin/pricing/${draftId}/publish`).expect(200)).body,
    );
    expect(published.ruleSet).toMatchObject({
      version: 2,
      status: 'published',
      publishedAt: '2026-12-01T10:00:00.000Z',
    });

    const list = ruleSetListResponse.parse((await owner.get('/api/admin/pricing').expect(200)).body);
    expect(list.ruleSets.map((r) => [r.version, r.status])).toEqual([
      [2, 'published'],
      [1, 'retired'],
    ]);
    expect(list.ruleSets[1]).toMatchObject({ quoteCount: 15, publishedAt: '2026-11-01T16:00:00.000Z' });
    expect(await quoteRuleSetIds()).toEqual(before);
    expect(new Set(before.map((q) => q.pricing_rule_set_id))).toEqual(new Set([1]));

    const quote = quotePreviewResponse.parse(
      (await harness.agent().post('/api/quotes/preview').send(daisyDressQuote).expect(200)).body,
    );
    expect(quote.quote.ruleSetVersion).toBe(2);
  });

  it('when the published list is published again, then it answers 409', async () => {
    expect((await owner.post(`/api/admin/pricing/${draftId}/publish`).expect(409)).body.error.message).toMatch(
      /only a draft can be published/,
    );
  });

  it('when the owner starts a new draft, then it is version 3, a copy of the published rules', async () => {
    const draft = ruleSetDetailResponse.parse((await owner.post('/api/admin/pricing/drafts').expect(201)).body);
    expect(draft.ruleSet).toMatchObject({
      version: 3,
      status: 'draft',
      publishedAt: null,
      createdByName: 'Marigold Ashby',
    });
    expect(draft.ruleSet.rules).toEqual(
      await (async () =>
        ruleSetDetailResponse.parse((await owner.get(`/api/admin/pricing/${draftId}`).expect(200)).body).ruleSet
          .rules)(),
    );
  });
});

async function quoteRuleSetIds() {
  return harness.db('quotes').select('id', 'pricing_rule_set_id', 'total_cents').orderBy('id');
}
