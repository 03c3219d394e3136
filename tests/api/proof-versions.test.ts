import { beforeAll, describe, expect, it } from 'vitest';
import { orderDetailResponse } from '../../server/src/contracts/admin-orders.ts';
import { customerOrderResponse } from '../../server/src/contracts/orders.ts';
import { adminOverviewResponse } from '../../server/src/contracts/admin-overview.ts';
import { productionSheetResponse } from '../../server/src/contracts/production-sheet.ts';
import { orderDesignResponse, repricedOrder, stitchFileResponse } from '../../server/src/contracts/proof-versions.ts';
import type { DesignDocument } from '../../server/src/contracts/designs.ts';
import { useApiHarness, type ApiAgent } from '../support/api-harness.ts';
import { errorOf, signedInAgent } from '../support/api-calls.ts';

/**
 * WB-1009 is Harriet's sunshine romper: her granddaughter's drawing (upload 1) 56 mm wide on the chest, its card
 * held and no proof sent yet. The file's steps run in order: figures entered, proof 1, a change asked for,
 * proof 2 with the studio's change and its price, approval at the new price, and the history of both versions.
 */
const harness = useApiHarness();
let staff: ApiAgent;
let harriet: ApiAgent;
beforeAll(async () => {
  staff = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
  harriet = await signedInAgent(harness, 'harriet@example.test');
});

const stitchFilePath = '/api/admin/orders/WB-1009/placements/sunshine/stitch-file';
const totalOf = async (number: string) =>
  Number((await harness.db('orders').where({ number }).first('total_cents')).total_cents);

const picturesToDigitize = async () => {
  const body = adminOverviewResponse.parse((await staff.get('/api/admin/overview').expect(200)).body);
  return body.actions.find((group) => group.kind === 'pictures_to_digitize')!.orders.map((order) => order.number);
};

describe('the stitch file of a customer’s picture, entered after digitizing', () => {
  let authorizedCents = 0;

  it('when a paid order’s picture has no stitch file yet, then Today lists it among the pictures to digitize', async () => {
    expect(await picturesToDigitize()).toEqual(['WB-1009']);
  });

  it('when staff enter a file with many more stitches than the estimate, then the price rises against what was authorized, and the order keeps its total', async () => {
    authorizedCents = await totalOf('WB-1009');
    const res = await staff
      .put(stitchFilePath)
      .send({ stitchCount: 42_000, colourCount: 4, fileName: 'lily-sun-56mm.dst' })
      .expect(200);
    const answer = stitchFileResponse.parse(res.body);
    expect(answer.stitchFile).toMatchObject({
      placementId: 'sunshine',
      stitchCount: 42_000,
      colourCount: 4,
      fileName: 'lily-sun-56mm.dst',
      enteredByName: expect.any(String),
    });
    expect(answer.price.authorizedTotalCents).toBe(authorizedCents);
    expect(answer.price.totalCents).toBeGreaterThan(authorizedCents);
    expect(answer.price.differenceCents).toBe(answer.price.totalCents - authorizedCents);
    // Four colours sew with three changes between them (common practice, no source).
    expect(answer.price.lines.find((line) => line.code === 'color-changes')?.label).toMatch(/3 colour changes/);
    expect(answer.price.lines.find((line) => line.code === 'stitching')?.label).toMatch(/42,000 stitches/);
    expect(answer.price.isPriceProvisional).toBe(false);
    // Only the customer's approval of a proof carrying the new price changes the order's total.
    expect(await totalOf('WB-1009')).toBe(authorizedCents);
    expect(await picturesToDigitize()).toEqual([]);
    const row = await harness.db('placement_stitch_files').first();
    expect(row).toMatchObject({ placement_id: 'sunshine', stitch_count: 42_000, colour_count: 4 });
  });

  it('when staff correct the file to fewer stitches, then the one row is updated and the price falls below what was authorized', async () => {
    const res = await staff
      .put(stitchFilePath)
      .send({ stitchCount: 900, colourCount: 1, fileName: 'lily-sun-56mm-v2.pes' })
      .expect(200);
    const { price } = stitchFileResponse.parse(res.body);
    expect(price.totalCents).toBeLessThan(authorizedCents);
    expect(price.differenceCents).toBeLessThan(0);
    expect(await harness.db('placement_stitch_files').count({ n: '*' }).first()).toMatchObject({ n: 1 });
  });

  it('when the figures are missing, not whole, or come with a price, then it is 400 with a sentence for each field', async () => {
    const bad = await staff
      .put(stitchFilePath)
      .send({ stitchCount: 0, colourCount: 2.5, fileName: '../machine/sun' })
      .expect(400);
    const error = errorOf(bad.body);
    expect(error.fields).toMatchObject({
      stitchCount: 'A stitch file has at least 1 stitch',
      colourCount: 'Type a whole number of colours',
      fileName: expect.stringMatching(/file name with its extension/),
    });
    const priced = await staff
      .put(stitchFilePath)
      .send({ stitchCount: 100, colourCount: 1, fileName: 'a.dst', totalCents: 1 })
      .expect(400);
    expect(errorOf(priced.body).message).toMatch(/the server works out the price itself/);
  });

  it('when the placement is not an uploaded picture or not on the order, then it is refused with a reason', async () => {
    const lettering = await staff
      .put('/api/admin/orders/WB-1010/placements/name/stitch-file')
      .send({ stitchCount: 100, colourCount: 1, fileName: 'clara.dst' })
      .expect(422);
    expect(errorOf(lettering.body).message).toMatch(/customer’s own pictures/);
    await staff
      .put('/api/admin/orders/WB-1009/placements/nowhere/stitch-file')
      .send({ stitchCount: 100, colourCount: 1, fileName: 'x.dst' })
      .expect(404);
  });

  it('when a customer calls the studio’s route, then it is refused', async () => {
    await harriet.put(stitchFilePath).send({ stitchCount: 100, colourCount: 1, fileName: 'x.dst' }).expect(403);
  });
});

describe('proof 2: the studio’s change, its price, and the customer’s approval', () => {
  let firstTotalCents = 0;
  let changed: DesignDocument;

  it('when proof 1 is sent with the digitized figures, then it carries their price against the authorized total', async () => {
    // Back to the larger file, so the proof's price rises above what was held.
    await staff.put(stitchFilePath).send({ stitchCount: 42_000, colourCount: 4, fileName: 'sun.dst' }).expect(200);
    await staff.post('/api/admin/orders/WB-1009/proofs').send({ source: 'render', message: 'Lily’s sun.' }).expect(201);
    const detail = orderDetailResponse.parse((await staff.get('/api/admin/orders/WB-1009').expect(200)).body);
    const proof = detail.proofs.at(-1)!;
    expect(proof.price!.previousTotalCents).toBe(detail.order.totalCents);
    expect(proof.price!.totalCents).toBeGreaterThan(detail.order.totalCents);
    expect(proof.changes).toEqual([]);
    firstTotalCents = proof.price!.totalCents;
    await harriet
      .post('/api/orders/WB-1009/proofs/1/change-request')
      .send({ comment: 'Could the sun sit a little higher, and add Lily’s name?', pins: [] })
      .expect(200);
  });

  it('when staff price a changed design, then the server prices it and says what changed; a price from the client is refused', async () => {
    const design = orderDesignResponse.parse((await staff.get('/api/admin/orders/WB-1009/design').expect(200)).body);
    expect(design.fromVersion).toBe(1);
    const sun = design.document.placements[0]!;
    if (sun.kind !== 'artwork') throw new Error('the romper’s placement is the picture');
    changed = {
      version: 1,
      placements: [
        { ...sun, centerYMm: sun.centerYMm - 5, widthMm: 60 },
        {
          id: 'lily',
          kind: 'lettering',
          zone: sun.zone,
          centerXMm: sun.centerXMm,
          centerYMm: sun.centerYMm + 40,
          rotationDeg: 0,
          text: 'Lily',
          font: 'breezy-script',
          letterHeightMm: 15,
          thread: 'WB-110',
        },
      ],
    };
    const res = await staff.post('/api/admin/orders/WB-1009/design/price').send({ document: changed }).expect(200);
    const price = repricedOrder.parse(res.body);
    expect(price.changes).toEqual([
      'Your picture moved 5 mm up, made 60 mm wide instead of 56 mm',
      'Name “Lily” added',
    ]);
    expect(price.lines.some((line) => line.code === 'lettering')).toBe(true);
    expect(price.totalCents).toBeGreaterThan(firstTotalCents);

    const tampered = await staff
      .post('/api/admin/orders/WB-1009/design/price')
      .send({ document: { ...changed, totalCents: 100 } })
      .expect(400);
    expect(errorOf(tampered.body).message).toMatch(/server works out prices/);
  });

  it('when a draft places a picture that is not on the order, then it is 400 naming the field', async () => {
    const sun = changed.placements[0]!;
    const foreign = { version: 1, placements: [{ ...sun, artworkUploadId: 99 }] };
    const res = await staff.post('/api/admin/orders/WB-1009/design/price').send({ document: foreign }).expect(400);
    expect(errorOf(res.body).fields).toHaveProperty(['document.placements.0.artworkUploadId']);
    await staff.post('/api/admin/orders/WB-1009/design/picture').send({ document: foreign }).expect(400);
  });

  it('when staff send proof 2 with the change, then the customer sees the new price against the previous one and what changed', async () => {
    const picture = await staff.post('/api/admin/orders/WB-1009/design/picture').send({ document: changed });
    expect(picture.status).toBe(200);
    expect(picture.headers['content-type']).toBe('image/png');
    await staff
      .post('/api/admin/orders/WB-1009/proofs')
      .send({ source: 'render', message: 'Moved up, with Lily’s name.', document: changed })
      .expect(201);
    const mine = customerOrderResponse.parse((await harriet.get('/api/orders/WB-1009').expect(200)).body);
    const proof2 = mine.proofs.find((proof) => proof.version === 2)!;
    expect(proof2.isAnswerable).toBe(true);
    expect(proof2.changes).toEqual([
      'Your picture moved 5 mm up, made 60 mm wide instead of 56 mm',
      'Name “Lily” added',
    ]);
    expect(proof2.price!.previousTotalCents).toBe(mine.order.totalCents);
    expect(proof2.price!.totalCents).toBeGreaterThan(proof2.price!.previousTotalCents);
    // The page shows the design as proof 2 has it.
    expect(mine.design.document.placements.map((p) => p.id)).toEqual(['sunshine', 'lily']);
    const mail = await harness.db('email_log').where({ template: 'proof_ready' }).orderBy('id', 'desc').first();
    expect(mail.text_body).toMatch(/approving the proof agrees to the new price/);
  });

  it('when the customer approves proof 2, then its price becomes the order’s totals and line, which the studio’s charge takes', async () => {
    const before = orderDetailResponse.parse((await staff.get('/api/admin/orders/WB-1009').expect(200)).body);
    const proof2 = before.proofs.find((proof) => proof.version === 2)!;
    await harriet.post('/api/orders/WB-1009/proofs/2/approval').send({ pins: [] }).expect(200);
    const after = orderDetailResponse.parse((await staff.get('/api/admin/orders/WB-1009').expect(200)).body);
    expect(after.order.status).toBe('proof_approved');
    expect(after.order.totalCents).toBe(proof2.price!.totalCents);
    expect(after.order.subtotalCents + after.order.taxCents).toBe(after.order.totalCents);
    expect(after.items[0]!.totalCents).toBe(after.order.subtotalCents);
    expect(after.events.slice(-2).map((event) => event.type)).toEqual(['proof_approved', 'price_changed']);
    const mine = customerOrderResponse.parse((await harriet.get('/api/orders/WB-1009').expect(200)).body);
    expect(mine.order.totalCents).toBe(proof2.price!.totalCents);
    expect(mine.quote.lines.some((line) => line.code === 'lettering')).toBe(true);
    expect(mine.timeline.map((entry) => entry.title)).toContain(
      `The order now comes to $${(proof2.price!.totalCents / 100).toFixed(2)}, as proof 2 showed`,
    );
  });

  it('when the studio prints the production sheet, then it makes the design as proof 2 had it, not as ordered', async () => {
    const mine = customerOrderResponse.parse((await harriet.get('/api/orders/WB-1009').expect(200)).body);
    const sheet = productionSheetResponse.parse(
      (await staff.get('/api/admin/orders/WB-1009/production-sheet').expect(200)).body,
    );
    expect(sheet.placements.map((placement) => placement.id)).toEqual(
      mine.design.document.placements.map((placement) => placement.id),
    );
    expect(sheet.placements.map((placement) => placement.id)).toContain('lily');
  });

  it('when the studio reads the history, then each version keeps its price and what changed, and the design can no longer be re-priced', async () => {
    const detail = orderDetailResponse.parse((await staff.get('/api/admin/orders/WB-1009').expect(200)).body);
    expect(detail.proofs.map((proof) => [proof.version, proof.status, proof.changes.length])).toEqual([
      [1, 'changes_requested', 0],
      [2, 'approved', 2],
    ]);
    expect(detail.proofs[1]!.price!.previousTotalCents).toBe(detail.proofs[0]!.price!.previousTotalCents);
    const late = await staff.put(stitchFilePath).send({ stitchCount: 100, colourCount: 1, fileName: 'x.dst' });
    expect(late.status).toBe(409);
    expect(errorOf(late.body).message).toMatch(/already approved/);
  });
});
