import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { quotePreviewResponse } from '../../server/src/contracts/quotes.ts';
import { savedDesignResponse } from '../../server/src/contracts/saved-designs.ts';
import { storedQuoteResponse } from '../../server/src/contracts/stored-quotes.ts';
import { checkoutStartedResponse, customerOrderResponse } from '../../server/src/contracts/orders.ts';
import { orderDetailResponse } from '../../server/src/contracts/admin-orders.ts';
import type { DesignDocument } from '../../server/src/contracts/designs.ts';
import { garments } from '../../seeds/data/garments.ts';
import { motifs } from '../../seeds/data/motifs.ts';
import { startPaymentHarness, type PaymentHarness } from '../support/payment-stand-ins.ts';
import { signedInAgent } from '../support/api-calls.ts';
import { daisyDressQuote } from '../support/sample-designs.ts';
import { priyaShipTo } from '../support/priya-orders.ts';

let harness: PaymentHarness;
beforeAll(async () => {
  harness = await startPaymentHarness();
});
afterAll(async () => {
  await harness.close();
});

const bishop = garments.find((garment) => garment.slug === 'bishop-dress')!;
const bunny = motifs.find((motif) => motif.slug === 'sitting-bunny')!;
const sixMonths = bishop.sizes.find((size) => size.code === '6m')!;

/** Two sitting bunnies at 80 % (28.8 × 56.8 mm) on the 6-month chest, their centres `apartMm` apart side to side. */
const twoBunnies = (apartMm: number): DesignDocument => ({
  version: 1,
  placements: [0, apartMm].map((dx, index) => ({
    id: index === 0 ? 'motif' : 'motif-2',
    kind: 'motif' as const,
    zone: 'chest',
    centerXMm: 200 + dx,
    centerYMm: 104.7,
    rotationDeg: 0,
    motif: bunny.slug,
    scalePct: 80,
    threads: bunny.threadCodes,
  })),
});
const onTheDress = (document: DesignDocument) => ({
  garmentId: bishop.id,
  sizeId: sixMonths.id,
  colourId: bishop.colours[0]!.id,
  document,
});
const design = (document: DesignDocument) => ({ ...onTheDress(document), quantity: 1, isRush: false });
const preview = async (document: DesignDocument) =>
  quotePreviewResponse.parse(
    (await harness.agent().post('/api/quotes/preview').send(design(document)).expect(200)).body,
  );

describe('POST /api/quotes/preview', () => {
  it('when two motifs are 18.8 mm apart, then the quote carries one overlap note naming both, by 10 mm', async () => {
    // Worked by hand: each bunny is 28.8 mm wide; centres 18.8 mm apart share 28.8 − 18.8 = 10 mm across, and
    // their full 56.8 mm height, so 10 mm the shallow way through.
    const { layoutNotes } = await preview(twoBunnies(18.8));
    expect(layoutNotes).toEqual([
      expect.objectContaining({
        code: 'layout.overlap',
        severity: 'caution',
        title: 'Two parts of the design overlap',
        text: expect.stringMatching(/^Sitting bunny and Sitting bunny overlap by 10 mm, so one would be stitched/),
      }),
    ]);
  });

  it('when the motifs stand clear of each other, or a border runs alone, then there is no overlap note', async () => {
    expect((await preview(twoBunnies(30))).layoutNotes).toEqual([]);
    const border = quotePreviewResponse.parse(
      (await harness.agent().post('/api/quotes/preview').send(daisyDressQuote).expect(200)).body,
    );
    expect(border.layoutNotes).toEqual([]);
  });
});

describe('an ordered design with overlapping placements', () => {
  it('when a customer orders it, then their order page and the studio’s order page both carry the overlap note', async () => {
    const priya = await signedInAgent(harness, 'priya@example.test');
    const saved = savedDesignResponse.parse(
      (
        await priya
          .post('/api/designs')
          .send({ ...onTheDress(twoBunnies(10)), name: 'Two bunnies close together' })
          .expect(201)
      ).body,
    ).design;
    const quote = storedQuoteResponse.parse(
      (
        await priya
          .post('/api/quotes')
          .send({ ...design(saved.document), designId: saved.id })
          .expect(201)
      ).body,
    );
    const started = checkoutStartedResponse.parse(
      (
        await priya
          .post('/api/orders')
          .send({
            quoteId: quote.quoteId,
            designId: saved.id,
            neededBy: '2026-12-18',
            shipTo: priyaShipTo,
            hasReadSafetyNotes: true,
          })
          .expect(201)
      ).body,
    );

    const mine = customerOrderResponse.parse((await priya.get(`/api/orders/${started.number}`).expect(200)).body);
    expect(mine.layoutNotes).toEqual([
      expect.objectContaining({ code: 'layout.overlap', text: expect.stringContaining('overlap by 19 mm') }),
    ]);
    const staff = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
    const studio = orderDetailResponse.parse((await staff.get(`/api/admin/orders/${started.number}`).expect(200)).body);
    expect(studio.layoutNotes).toEqual(mine.layoutNotes);
  });
});
