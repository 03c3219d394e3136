import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { garmentDetailResponse } from '../../server/src/contracts/catalogue.ts';
import { studioGarmentListResponse } from '../../server/src/contracts/admin-catalogue-garments.ts';
import { quotePreviewResponse } from '../../server/src/contracts/quotes.ts';
import { checkoutStartedResponse, customerOrderResponse } from '../../server/src/contracts/orders.ts';
import { apiErrorBody } from '../../server/src/contracts/errors.ts';
import { startPaymentHarness, type PaymentHarness } from '../support/payment-stand-ins.ts';
import { signedInAgent } from '../support/api-calls.ts';
import { productionSheetResponse } from '../../server/src/contracts/production-sheet.ts';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { quoteSavedDesign } from '../support/priya-orders.ts';

let harness: PaymentHarness;
beforeAll(async () => {
  harness = await startPaymentHarness();
});
afterAll(async () => {
  await harness.close();
});

const shipTo = {
  name: 'Dominic Aldana',
  line1: '7 Wicket Row',
  city: 'Fernhollow',
  region: 'OR',
  postalCode: '97000',
  countryCode: 'US',
};
// The harness clock reads Tuesday 2026-12-01; ten working days on, a regular order is ready on the 15th.
const neededBy = '2026-12-18';

const garmentPage = async (slug: string) =>
  garmentDetailResponse.parse((await harness.agent().get(`/api/catalogue/garments/${slug}`).expect(200)).body).garment;
const codesOf = (messages: { code: string }[]) => messages.map((message) => message.code);

const quoteFor = quoteSavedDesign;

describe('GET /api/catalogue/garments/:slug', () => {
  it('when a parent opens the sun bonnet, then every size carries the ribbon-ties caution and the youngest sizes the thread-ends note', async () => {
    const bonnet = await garmentPage('sun-bonnet');
    expect(bonnet.safety).toEqual({
      tiePlaces: ['neck'],
      drawstringPlaces: [],
      closure: 'ties',
      closesAtNeck: true,
      intendedUse: 'day_wear',
    });
    expect(bonnet.sizes.map((size) => [size.code, size.minAgeMonths, size.maxAgeMonths])).toEqual([
      ['0-3m', 0, 3],
      ['3-6m', 3, 6],
      ['6-12m', 6, 12],
      ['12-24m', 12, 24],
    ]);
    for (const size of bonnet.sizes) {
      // Ties round the neck: common practice, no source (ASTM F1816 names drawstrings, not ties).
      expect(codesOf(size.cautions)).toEqual(['caution.neck-ties', 'caution.thread-ends', 'caution.local-rules']);
      expect(size.cautions[0]).toMatchObject({ severity: 'caution', title: 'Ribbon ties under the chin' });
    }
  });

  it('when a parent opens the terry bib, then it says it fastens round the neck with a snap, and a day-wear dress says nothing of the neck', async () => {
    const bib = await garmentPage('terry-bib');
    const small = bib.sizes.find((size) => size.code === 'small')!;
    expect(small.cautions[0]).toMatchObject({ code: 'caution.neck-closure', severity: 'caution' });
    expect(small.cautions[0]!.text).toMatch(/^This garment fastens round the neck with a snap\./);
    const dress = await garmentPage('smocked-yoke-dress');
    // 16 CFR 1501 starts under 36 months: the 3T size (36–48 months) is past it, so only the local-rules note stays.
    expect(codesOf(dress.sizes.find((size) => size.code === '3T')!.cautions)).toEqual(['caution.local-rules']);
    expect(codesOf(dress.sizes.find((size) => size.code === '6m')!.cautions)).toEqual([
      'caution.thread-ends',
      'caution.local-rules',
    ]);
  });
});

describe('PUT /api/admin/catalogue/garments/:id', () => {
  it('when the studio states the romper is sleepwear with a waist drawstring, then its page shows the sleepwear warning (16 CFR 1615/1616) and the drawstring caution (ASTM F1816)', async () => {
    const staff = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
    const romper = studioGarmentListResponse
      .parse((await staff.get('/api/admin/catalogue/garments').expect(200)).body)
      .garments.find((garment) => garment.slug === 'bubble-romper')!;
    const { name, kind, description, fabricType, isNapped, minAgeMonths, maxAgeMonths } = romper;
    const facts = { ...romper.safety, intendedUse: 'sleepwear', drawstringPlaces: ['waist'] };
    const body = { name, kind, description, fabricType, isNapped, minAgeMonths, maxAgeMonths, ...facts };
    await staff.put(`/api/admin/catalogue/garments/${romper.id}`).send(body).expect(200);
    try {
      const page = await garmentPage('bubble-romper');
      expect(page.safety).toMatchObject({ intendedUse: 'sleepwear', drawstringPlaces: ['waist'] });
      expect(codesOf(page.sizes.at(-1)!.cautions)).toEqual([
        'caution.sleepwear',
        'caution.waist-drawstring',
        'caution.thread-ends',
        'caution.local-rules',
      ]);
      const refused = await staff
        .put(`/api/admin/catalogue/garments/${romper.id}`)
        .send({ ...body, tiePlaces: ['sleeve'] })
        .expect(400);
      expect(apiErrorBody.parse(refused.body).error.fields).toHaveProperty('tiePlaces.0');
    } finally {
      await staff
        .put(`/api/admin/catalogue/garments/${romper.id}`)
        .send({ ...body, ...romper.safety })
        .expect(200);
    }
  });
});

describe('POST /api/quotes/preview', () => {
  const bibWithMotif = (motif: string) => ({
    garmentId: 4,
    sizeId: 401,
    quantity: 1,
    isRush: false,
    document: {
      version: 1,
      placements: [
        {
          id: 'bunny',
          kind: 'motif',
          zone: 'bib_centre',
          centerXMm: 105,
          centerYMm: 155,
          rotationDeg: 0,
          motif,
          scalePct: 100,
          threads: ['WB-128', 'WB-109', 'WB-124'],
        },
      ],
    },
  });

  it('when a design on the small bib places a motif with buttons, then the quote warns of choking (16 CFR 1501) beside the neck fastening', async () => {
    const plain = quotePreviewResponse.parse(
      (await harness.agent().post('/api/quotes/preview').send(bibWithMotif('sitting-bunny')).expect(200)).body,
    );
    expect(codesOf(plain.cautions)).toEqual(['caution.neck-closure', 'caution.thread-ends', 'caution.local-rules']);

    await harness
      .db('motifs')
      .where({ slug: 'sitting-bunny' })
      .update({ trims: JSON.stringify(['buttons']) });
    try {
      const trimmed = quotePreviewResponse.parse(
        (await harness.agent().post('/api/quotes/preview').send(bibWithMotif('sitting-bunny')).expect(200)).body,
      );
      expect(trimmed.cautions.map((caution) => [caution.code, caution.severity])).toEqual([
        ['caution.small-parts', 'warning'],
        ['caution.neck-closure', 'caution'],
        ['caution.thread-ends', 'info'],
        ['caution.local-rules', 'info'],
      ]);
      expect(trimmed.cautions[0]!.text).toContain('16 CFR 1501');
    } finally {
      await harness.db('motifs').where({ slug: 'sitting-bunny' }).update({ trims: '[]' });
    }
  });
});

describe('POST /api/orders with safety notes', () => {
  it('when Dominic orders his bonnet without ticking the safety notes, then it is 422 with a sentence; ticked, the order is placed and the tick recorded', async () => {
    const dominic = await signedInAgent(harness, 'dominic@example.test');
    const quote = await quoteFor(dominic, 10);
    expect(codesOf(quote.cautions)).toContain('caution.neck-ties');
    const order = { quoteId: quote.quoteId, designId: 10, neededBy, shipTo };

    const refused = await dominic.post('/api/orders').send(order).expect(422);
    expect(apiErrorBody.parse(refused.body).error).toEqual({
      kind: 'needs-acknowledgement',
      message:
        'Please read the safety notes for this garment (Ribbon ties under the chin) and tick that you have read them before paying.',
      fields: { hasReadSafetyNotes: 'Tick that you have read the safety notes' },
    });
    const untickedCount = await harness.db('orders').count({ n: '*' }).first();

    const placed = checkoutStartedResponse.parse(
      (
        await dominic
          .post('/api/orders')
          .send({ ...order, hasReadSafetyNotes: true })
          .expect(201)
      ).body,
    );
    const row = await harness.db('orders').where({ number: placed.number }).first();
    const event = await harness.db('order_events').where({ order_id: row.id, type: 'safety_notes_read' }).first();
    expect(event).toMatchObject({ actor_user_id: expect.any(Number) });
    const payload = typeof event.payload === 'string' ? JSON.parse(event.payload) : event.payload;
    expect(payload).toEqual({ codes: ['caution.neck-ties'] });
    expect(Number((await harness.db('orders').count({ n: '*' }).first())!.n)).toBe(Number(untickedCount!.n) + 1);

    const page = customerOrderResponse.parse((await dominic.get(`/api/orders/${placed.number}`).expect(200)).body);
    expect(codesOf(page.cautions)).toEqual(['caution.neck-ties', 'caution.thread-ends', 'caution.local-rules']);
    expect(page.timeline.map((entry) => entry.title)).toContain('You read the safety notes for this garment');
  });
});

describe('GET /api/admin/orders/:number/production-sheet', () => {
  const pdfText = async (bytes: Buffer) => {
    // Read back with pdfjs-dist, independent of the pdfkit that wrote it.
    const pdf = await getDocument({ data: new Uint8Array(bytes), useSystemFonts: false }).promise;
    const pages = await Promise.all(
      Array.from({ length: pdf.numPages }, async (_, i) => (await pdf.getPage(i + 1)).getTextContent()),
    );
    return pages
      .flatMap((page) => page.items.map((item) => ('str' in item ? item.str : '')))
      .join(' ')
      .replace(/\s+/g, ' ');
  };

  it('when the studio prints the sheet of Harriet’s small bib, then page and PDF carry the neck-fastening caution', async () => {
    const staff = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
    const sheet = productionSheetResponse.parse(
      (await staff.get('/api/admin/orders/WB-1001/production-sheet').expect(200)).body,
    );
    expect(codesOf(sheet.cautions)).toEqual(['caution.neck-closure', 'caution.thread-ends', 'caution.local-rules']);
    const res = await staff
      .get('/api/admin/orders/WB-1001/production-sheet.pdf?paper=letter')
      .buffer(true)
      .parse((response, done) => {
        const chunks: Buffer[] = [];
        response.on('data', (chunk: Buffer) => chunks.push(chunk));
        response.on('end', () => done(null, Buffer.concat(chunks)));
      })
      .expect(200);
    const text = await pdfText(res.body as Buffer);
    expect(text).toContain('Fastens round the neck: This garment fastens round the neck with a snap.');
    expect(text).toContain('follow your local regulations');
  });
});
