import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { quotePreviewResponse, type QuotePreviewRequest } from '../../server/src/contracts/quotes.ts';
import { restoreDesign, type DesignPlacement } from '../../server/src/contracts/designs.ts';
import { apiErrorBody } from '../../server/src/contracts/errors.ts';
import {
  estimateBorderStitches,
  estimateStitches,
  fitBorder,
  planHoopings,
  priceQuote,
  type PricingRuleSet,
} from '../../server/src/engine/index.ts';
import { garments } from '../../seeds/data/garments.ts';
import { shopSettings } from '../../seeds/data/shop.ts';
import { shippingRatesOfRow } from '../../server/src/db/shipping-rates-columns.ts';
import { motifs } from '../../seeds/data/motifs.ts';
import { useApiHarness } from '../support/api-harness.ts';
import { chestLettering } from '../support/sample-designs.ts';

const harness = useApiHarness();

const bishop = garments.find((garment) => garment.slug === 'bishop-dress')!;
const sixMonths = bishop.sizes.find((size) => size.code === '6m')!;
const daisy = motifs.find((motif) => motif.slug === 'daisy-chain')!;

const daisyBorder: DesignPlacement = {
  id: 'hem',
  kind: 'border',
  zone: 'hem',
  motif: 'daisy-chain',
  run: 'circumference',
  hemOffsetMm: 44.45,
  threads: daisy.threadCodes,
};

/** The 6-month bishop dress (692 mm hem) with a daisy chain round it: issue 3's worked case on the seeded shop. */
const bishopWithDaisies: QuotePreviewRequest = {
  garmentId: bishop.id,
  sizeId: sixMonths.id,
  colourId: bishop.colours[0].id,
  quantity: 1,
  isRush: false,
  document: { version: 1, placements: [daisyBorder] },
};

const preview = (body: unknown) =>
  harness
    .agent()
    .post('/api/quotes/preview')
    .send(body as object);

describe('POST /api/quotes/preview', () => {
  it('when the daisy chain goes round the 692 mm hem of the 6-month bishop dress, then it is 4 repeats in 4 hoopings of the oblong hoop', async () => {
    // The trade's worked case (common practice, no source): 692 mm loop, 180 mm motif allowed 90–110 % → 4 × 173 mm
    // at 96.1 %, one repeat per 120 × 180 mm field.
    const res = await preview(bishopWithDaisies).expect(200);
    const body = quotePreviewResponse.parse(res.body);
    expect(body.placements).toHaveLength(1);
    expect(body.placements[0]).toMatchObject({
      id: 'hem',
      kind: 'border',
      hoopings: 4,
      border: { count: 4, scalePct: 96.11, hoopSlug: 'oblong-120x180' },
    });
    expect(body.placements[0].border!.repeatWidthMm).toBeCloseTo(173, 6);
    expect(body.placements[0].widthMm).toBeCloseTo(692, 6);
  });

  it('when a design is priced, then its lines add up to the total, which is what the engine makes of the same inputs', async () => {
    const body = quotePreviewResponse.parse(
      (await preview({ ...bishopWithDaisies, quantity: 3, isRush: true }).expect(200)).body,
    );
    const { quote } = body;
    expect(quote.lines.reduce((sum, line) => sum + line.amountCents, 0)).toBe(quote.totalCents);
    expect(quote.subtotalCents + quote.shippingCents + quote.taxCents).toBe(quote.totalCents);

    // The same figures straight from the engine and the published price list.
    const { rules } = await harness.db('pricing_rule_sets').select('rules').where({ status: 'published' }).first();
    const fit = fitBorder({ runLengthMm: 692, closed: true, motifWidthMm: 180, minScale: 0.9, maxScale: 1.1 });
    if (!fit.ok) throw new Error(fit.reason);
    const plan = planHoopings({
      count: fit.count,
      repeatWidthMm: fit.repeatWidthMm,
      pitchMm: fit.pitchMm,
      motifHeightMm: daisy.heightMm * fit.scale,
      hoop: { fieldWidthMm: 120, fieldHeightMm: 180 },
    });
    if (!plan.ok) throw new Error(plan.reason);
    const repeat = estimateStitches({
      kind: 'catalogue',
      motif: {
        stitchCount: daisy.run + daisy.satin + daisy.fill,
        mix: { run: daisy.run, satin: daisy.satin, fill: daisy.fill },
        colorChanges: daisy.threadCodes.length - 1,
        widthMm: 180,
        heightMm: daisy.heightMm,
      },
      scale: fit.scale,
    });
    if (!repeat.ok) throw new Error(repeat.reason);
    const border = estimateBorderStitches({ repeat, fit, hoopings: plan.hoopings.length });
    if (!border.ok) throw new Error(border.reason);
    const expected = priceQuote({
      ruleSet: rules as PricingRuleSet,
      garment: { slug: bishop.slug, name: bishop.name },
      sizeCode: sixMonths.code,
      sizeLabel: sixMonths.label,
      quantity: 3,
      isRush: true,
      // Without a method asked for, the shop's first: delivery, at the seeded rates.
      shipping: { rates: shippingRatesOfRow(shopSettings), method: 'delivery' },
      placements: [
        {
          id: 'hem',
          label: `Hem border: ${daisy.name}`,
          kind: 'stitching',
          stitches: border.stitches,
          hoopings: 4,
          colorChanges: border.colorChanges,
          hasCustomerArtwork: false,
        },
      ],
    });
    if (!expected.ok) throw new Error(expected.reason);
    expect(quote).toEqual({
      lines: expected.lines,
      subtotalCents: expected.subtotalCents,
      shippingCents: expected.shippingCents,
      taxCents: expected.taxCents,
      totalCents: expected.totalCents,
      currency: 'USD',
      ruleSetVersion: 1,
      shipping: {
        ...expected.shipping,
        freeDeliveryFromCents: shopSettings.delivery_free_from_cents,
        pickupNote: shopSettings.pickup_note,
      },
    });
    expect(body.placements[0].stitches).toBe(border.stitches);
  });

  it('when a seeded design is priced again, then the server quotes what the seeds stored for it', async () => {
    const stored = await harness
      .db('quotes as q')
      .join('designs as d', 'd.id', 'q.design_id')
      .select('q.*', 'd.garment_id', 'd.garment_size_id', 'd.fabric_colour_id', 'd.document');
    // Only its owner may price the design with the customer's drawing, so it is left out here (see artwork.test.ts).
    const priced = stored.filter(
      (quote) => !quote.document.placements.some((placement: DesignPlacement) => placement.kind === 'artwork'),
    );
    expect(priced.length).toBeGreaterThanOrEqual(10);
    for (const quote of priced) {
      const choice = {
        garmentId: quote.garment_id,
        sizeId: quote.garment_size_id,
        colourId: quote.fabric_colour_id,
        quantity: quote.quantity,
        isRush: Boolean(quote.is_rush),
        document: quote.document,
      };
      const body = quotePreviewResponse.parse((await preview(choice).expect(200)).body);
      expect({ design: quote.design_id, lines: body.quote.lines, totalCents: body.quote.totalCents }).toEqual({
        design: quote.design_id,
        lines: quote.lines,
        totalCents: quote.total_cents,
      });
      expect(body.placements.reduce((sum, placement) => sum + placement.hoopings, 0)).toBe(quote.hooping_count);
    }
  });

  it('when the seeds stored design documents, then every one restores', async () => {
    const rows = await harness.db('designs').select('id', 'document');
    expect(rows.length).toBeGreaterThan(10);
    expect(rows.filter((row) => !restoreDesign(row.document).success).map((row) => row.id)).toEqual([]);
  });

  it('when a visitor who has not signed in asks, then they get a quote, with stabilizer advice and cautions', async () => {
    const res = await request(harness.app)
      .post('/api/quotes/preview')
      .set('Origin', harness.config.appOrigin)
      .send(bishopWithDaisies)
      .expect(200);
    const body = quotePreviewResponse.parse(res.body);
    expect(body.stabilizer.backing).toBeTruthy();
    expect(body.cautions.map((message) => message.code)).toContain('caution.local-rules');
    expect(body.runMinutes.items.map((item) => item.code)).toEqual([
      'sewing',
      'color-changes',
      'trims',
      'hoopings',
      'setup',
    ]);
  });

  it('when a customer is signed in, then they get the same quote', async () => {
    const agent = harness.agent();
    await harness.signIn(agent, 'priya@example.test');
    const [signedIn, anonymous] = await Promise.all([
      agent.post('/api/quotes/preview').send(bishopWithDaisies).expect(200),
      preview(bishopWithDaisies).expect(200),
    ]);
    expect(signedIn.body.quote).toEqual(anonymous.body.quote);
  });

  it('when the request carries its own price or stitch count, then it is refused and names what to leave out', async () => {
    const withPrice = await preview({ ...bishopWithDaisies, totalCents: 1 }).expect(400);
    expect(apiErrorBody.parse(withPrice.body).error).toMatchObject({
      kind: 'invalid',
      fields: { '(request)': 'Leave out totalCents: the server works out prices, stitch counts and hoopings itself' },
    });
    const withStitches = await preview({
      ...bishopWithDaisies,
      document: { version: 1, placements: [{ ...daisyBorder, stitches: 10, hoopings: 1 }] },
    }).expect(400);
    expect(apiErrorBody.parse(withStitches.body).error.fields).toEqual({
      'document.placements.0':
        'Leave out stitches, hoopings: the server works out prices, stitch counts and hoopings itself',
    });
  });

  it('when the quantity is 0, then it is a 400 a person can read', async () => {
    const res = await preview({ ...bishopWithDaisies, quantity: 0 }).expect(400);
    expect(apiErrorBody.parse(res.body).error).toEqual({
      kind: 'invalid',
      message: 'Please check “quantity”: Order at least 1 garment.',
      fields: { quantity: 'Order at least 1 garment' },
    });
  });

  it('when the body is not JSON, then it is a 400, not a 500', async () => {
    const res = await harness
      .agent()
      .post('/api/quotes/preview')
      .set('Content-Type', 'application/json')
      .send('{"garmentId": 3,')
      .expect(400);
    expect(res.body.error).toEqual({ kind: 'invalid', message: 'The request body is not valid JSON.' });
    await harness.agent().post('/api/quotes/preview').send([1, 2]).expect(400);
    await harness.agent().post('/api/quotes/preview').expect(400);
  });

  it('when the size is not one of the garment’s, then it is a 404', async () => {
    const otherGarmentsSize = garments.find((garment) => garment.slug === 'terry-bib')!.sizes[0].id;
    for (const sizeId of [999_999, otherGarmentsSize]) {
      const res = await preview({ ...bishopWithDaisies, sizeId }).expect(404);
      expect(res.body.error).toMatchObject({ kind: 'not-found', fields: { sizeId: expect.any(String) } });
    }
  });

  it('when a placement names a motif the shop does not have, then it is a 400 at that field', async () => {
    const res = await preview({
      ...bishopWithDaisies,
      document: { version: 1, placements: [{ ...daisyBorder, motif: 'dancing-hippos' }] },
    }).expect(400);
    expect(res.body.error.fields).toEqual({
      'document.placements.0.motif': 'There is no motif “dancing-hippos” in the catalogue; choose another.',
    });
  });

  it('when the border asks for a count that does not fit, then the reason comes back at the count', async () => {
    const res = await preview({
      ...bishopWithDaisies,
      document: { version: 1, placements: [{ ...daisyBorder, count: 5 }] },
    }).expect(400);
    expect(res.body.error.message).toBe(
      "The Daisy and leaf chain doesn't fit round the hem in size 6 months: 5 repeats would need 76.9 % — below the 90 % minimum for this motif. 4 repeats would fit.",
    );
    expect(Object.keys(res.body.error.fields)).toEqual(['document.placements.0.count']);
  });

  it('when a visitor prices someone else’s artwork upload, then it is not available to them', async () => {
    const artwork: DesignPlacement = {
      id: 'sun',
      kind: 'artwork',
      zone: 'chest',
      centerXMm: 200,
      centerYMm: 100,
      rotationDeg: 0,
      artworkUploadId: 1,
      widthMm: 56,
    };
    const res = await preview({ ...bishopWithDaisies, document: { version: 1, placements: [artwork] } }).expect(400);
    expect(res.body.error.fields).toEqual({
      'document.placements.0.artworkUploadId': 'That artwork upload is not available; upload it again.',
    });
  });

  it('when the studio has no published price list, then it is a conflict, not a 500', async () => {
    await harness.db('pricing_rule_sets').where({ status: 'published' }).update({ status: 'retired' });
    try {
      const res = await preview(bishopWithDaisies).expect(409);
      expect(res.body.error.kind).toBe('conflict');
    } finally {
      await harness.db('pricing_rule_sets').where({ id: 1 }).update({ status: 'published' });
    }
  });
});

describe('GET /api/quotes/ready-dates', () => {
  it('when anyone asks on Tuesday 1 December, then an order is ready in 10 working days, a rush in 5', async () => {
    // The harness's clock reads 1 December 2026, a Tuesday (Gregorian calendar); the seeded lead time is 10 working days.
    const response = await request(harness.app).get('/api/quotes/ready-dates').expect(200);
    expect(response.body).toEqual({
      leadTimeDays: 10,
      earliestReadyDate: '2026-12-15',
      earliestRushDate: '2026-12-08',
    });
  });
});

describe('POST /api/quotes/preview: names beyond basic Latin', () => {
  const withName = (text: string, font: string): QuotePreviewRequest => ({
    ...bishopWithDaisies,
    document: {
      version: 1,
      placements: [chestLettering(text, font, 20)],
    },
  });
  const stitchesOf = async (text: string, font: string) =>
    quotePreviewResponse.parse((await preview(withName(text, font)).expect(200)).body).placements[0].stitches;

  it.each([
    ['Polish', 'Łucja', 'Lucja', 'breezy-script'],
    ['Czech', 'Šárka', 'Sarka', 'heirloom-serif'],
    ['Vietnamese', 'Nguyễn', 'Nguyen', 'breezy-script'],
    ['Cyrillic', 'Маша', 'Masha', 'heirloom-serif'],
  ])('when a %s name (%s) is lettered, then it is priced from its own letters', async (_, name, plain, font) => {
    // The designer shows these letters from the font's latin-ext, vietnamese and cyrillic files (@fontsource
    // unicode.json); the quote reads the same files, so Ł, Š, á, ễ and Cyrillic letters are measured, not boxes.
    const [named, asPlain] = [await stitchesOf(name, font), await stitchesOf(plain, font)];
    expect(named).toBeGreaterThan(0);
    expect(named).not.toBe(asPlain);
  });

  it('when a name has letters the font does not have, then it is refused with 422 naming each of them', async () => {
    const res = await preview(withName('Маша', 'rounded-block')).expect(422);
    const { error } = apiErrorBody.parse(res.body);
    expect(error.kind).toBe('unprocessable');
    expect(error.fields?.['document.placements.0.text']).toBe(
      'Rounded Block cannot stitch “М” (Cyrillic capital letter em), “а” (Cyrillic small letter a) and “ш” (Cyrillic small letter sha): ' +
        'the font has no letter for them; choose another font or leave them out.',
    );
    const vietnamese = apiErrorBody.parse((await preview(withName('Nguyễn', 'rounded-block')).expect(422)).body);
    expect(vietnamese.error.message).toMatch(
      /^Rounded Block cannot stitch “ễ” \(Latin small letter e with circumflex and tilde\): the font has no letter for it;/,
    );
  });
});
