import { beforeAll, describe, expect, it } from 'vitest';
import { productionSheetResponse, type ProductionSheet } from '../../server/src/contracts/production-sheet.ts';
import type { DesignDocument } from '../../server/src/contracts/designs.ts';
import { MM_PER_INCH } from '../../server/src/engine/units.ts';
import { useApiHarness, type ApiAgent } from '../support/api-harness.ts';
import { signedInAgent } from '../support/api-calls.ts';
import { readPdfText } from '../support/pdf-text.ts';
import { uploadPlainPicture } from '../support/upload-picture.ts';
import { orderDesignOf } from '../support/order-design.ts';

/**
 * WB-1013 (seeds/data/orders.ts) is Harriet's approved 6-month bishop dress: a daisy chain round the hem in four
 * hoopings of the 120 × 180 hoop, and a lamb below the smocking. The tests add lettering inside the left border
 * hooping, a star half over the right one, and her granddaughter's sun drawing (upload 1) on the front.
 * The 6-month size draws the bishop at 0.9105 of its reference drawing (seeds/data/garments.ts): 418.83 mm wide,
 * the neckline 49 × 0.9105 = 44.61 mm down, the hem zone's bottom 409.73 mm down.
 */
const ORDER = 'WB-1013';
const sheetPath = `/api/admin/orders/${ORDER}/production-sheet`;
const CENTRE_FRONT_MM = 418.83 / 2;

const harness = useApiHarness();
let staff: ApiAgent;

async function setPlacements(extra: DesignDocument['placements']): Promise<void> {
  const design = await orderDesignOf(harness.db, ORDER);
  const base = design.document.placements.filter((placement) => placement.id === 'hem' || placement.id === 'lamb');
  await harness
    .db('designs')
    .where({ id: design.id })
    .update({ document: JSON.stringify({ version: 1, placements: [...base, ...extra] }) });
}

async function fetchSheet() {
  const res = await staff.get(sheetPath);
  if (res.status !== 200) throw new Error(JSON.stringify(res.body));
  return productionSheetResponse.parse(res.body);
}
const placementOf = (sheet: ProductionSheet, id: string) => sheet.placements.find((placement) => placement.id === id)!;

beforeAll(async () => {
  staff = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
});

describe('the production sheet, per placement other than the border', () => {
  let sheet: ProductionSheet;
  beforeAll(async () => {
    await setPlacements([
      {
        id: 'name',
        kind: 'lettering',
        zone: 'hem',
        centerXMm: CENTRE_FRONT_MM - 86.5,
        centerYMm: 322,
        rotationDeg: 0,
        text: 'Rosie',
        font: 'rounded-block',
        letterHeightMm: 12,
        thread: 'WB-101',
      },
      {
        id: 'star',
        kind: 'motif',
        zone: 'hem',
        centerXMm: CENTRE_FRONT_MM + 86.5,
        centerYMm: 300,
        rotationDeg: 0,
        motif: 'star-and-moon',
        scalePct: 80,
        threads: ['WB-103', 'WB-104'],
      },
      {
        id: 'sun',
        kind: 'artwork',
        zone: 'chest',
        centerXMm: CENTRE_FRONT_MM + 30,
        centerYMm: 180,
        rotationDeg: 10,
        artworkUploadId: 1,
        widthMm: 40,
      },
    ]);
    sheet = await fetchSheet();
  });

  it('when a placement is read off the sheet, then its centre is measured from the centre front and the nearest landmark, in mm and inches', () => {
    // 1 in = 25.4 mm exactly (the international inch: NIST SP 811 (2008), Appendix B.8), so 60.11 mm is
    // 2.3665 in, 37.86 sixteenths: 2 3/8 in to the nearest sixteenth, as a tape measure reads.
    expect(MM_PER_INCH).toBe(25.4);
    const lamb = placementOf(sheet, 'lamb').position!;
    expect(lamb).toMatchObject({ fromCentreFrontMm: 0, landmark: 'neckline', rotationDeg: 0 });
    expect(lamb.belowLandmarkMm).toBeCloseTo(104.72 - 49 * 0.9105, 1);
    expect(lamb.words).toBe('Design centre on the centre front, 60.1 mm (2 3/8 in) below the neckline.');
    // The name sits 87.73 mm above the hem edge (409.73 − 322): 3.454 in, 55.26 sixteenths → 3 7/16 in; and
    // 86.5 mm left of the centre front: 3.406 in, 54.49 sixteenths → 3 3/8 in.
    const name = placementOf(sheet, 'name').position!;
    expect(name.landmark).toBe('hem edge');
    expect(name.belowLandmarkMm).toBeCloseTo(-87.73, 1);
    expect(name.words).toBe(
      'Design centre 86.5 mm (3 3/8 in) left of the centre front (as you face it), 87.7 mm (3 7/16 in) above the hem edge.',
    );
    expect(placementOf(sheet, 'sun').position!.words).toMatch(
      /30 mm \(1 3\/16 in\) right of the centre front.*turned 10° clockwise/,
    );
    expect(placementOf(sheet, 'hem').position).toBeNull();
  });

  it('when the placement is lettering, then the sheet names its font and finished letter height', () => {
    expect(placementOf(sheet, 'name').lettering).toEqual({
      text: 'Rosie',
      fontName: 'Rounded Block',
      letterHeightMm: 12,
      // 12 mm = 0.472 in, 7.56 sixteenths → 1/2 in.
      words: '“Rosie” in Rounded Block, capital letters 12 mm (1/2 in) tall when stitched.',
    });
    expect(placementOf(sheet, 'lamb').lettering).toBeNull();
  });

  it('when a placement lies in a border hooping, then it is warned: wholly inside is sewn in that hooping, partly inside after it', () => {
    const hoopings = placementOf(sheet, 'hem').border!.hoopings;
    const left = hoopings.find((hooping) => Math.abs(hooping.fromCentreMm + 86.5) < 0.01)!;
    const right = hoopings.find((hooping) => Math.abs(hooping.fromCentreMm - 86.5) < 0.01)!;
    expect(placementOf(sheet, 'name').hoopingWarning).toMatchObject({
      borderPlacementId: 'hem',
      hoopingOrder: left.order,
      hoopName: expect.stringContaining('120'),
      when: 'in-that-hooping',
    });
    const star = placementOf(sheet, 'star').hoopingWarning!;
    expect(star).toMatchObject({ hoopingOrder: right.order, when: 'after-that-hooping' });
    expect(star.text).toContain(`sew it after that hooping`);
    expect(placementOf(sheet, 'lamb').hoopingWarning).toBeNull();
    expect(placementOf(sheet, 'sun').hoopingWarning).toBeNull();
  });

  it('when the sheet gives the stitching order, then the border comes first, the lettering in its hooping next, then the rest from the top down', () => {
    expect(sheet.sewingOrder.steps.map((step) => step.placementId)).toEqual(['hem', 'name', 'lamb', 'sun', 'star']);
    expect(sheet.placements.map((placement) => [placement.id, placement.sewOrder])).toEqual([
      ['hem', 1],
      ['lamb', 3],
      ['name', 2],
      ['star', 5],
      ['sun', 4],
    ]);
    expect(sheet.sewingOrder.steps[1]!.text).toMatch(/in border hooping \d, before the hoop comes off/);
    expect(sheet.sewingOrder.rule).toMatch(/^Sew the border first/);
  });

  it('when the placement is the customer’s drawing, then its threads are the palette’s nearest to its colours and it has a 1:1 template', () => {
    // seeds/uploads/sunshine-drawing.svg paints #F6D44A, then #F2A93B, then #C2253F: the palette's own Buttercup,
    // Marigold Glow and Strawberry Patch (seeds/data/threads.ts), a colour difference of 0.
    expect(placementOf(sheet, 'sun').threads).toEqual([
      { order: 1, code: 'WB-103', name: 'Buttercup', hex: '#F6D44A' },
      { order: 2, code: 'WB-104', name: 'Marigold Glow', hex: '#F2A93B' },
      { order: 3, code: 'WB-107', name: 'Strawberry Patch', hex: '#C2253F' },
    ]);
    const template = sheet.templates.find((candidate) => candidate.placementId === 'sun')!;
    // The drawing is 600 × 600, so 40 mm wide is 40 mm tall at 1:1.
    expect(template.artwork.widthMm).toBeCloseTo(40, 6);
    expect(template.artwork.heightMm).toBeCloseTo(40, 6);
    expect(template.outlines.map((outline) => outline.hex)).toEqual(['#f6d44a', '#f2a93b', '#c2253f']);
    expect(template.pictureDataUrl).toBeNull();
  });

  it('when the sheet is printed, then the PDF carries each placement’s position, lettering, stitching order and warning', async () => {
    const res = await staff
      .get(`${sheetPath}.pdf?paper=letter`)
      .buffer(true)
      .parse((stream, done) => {
        const chunks: Buffer[] = [];
        stream.on('data', (chunk: Buffer) => chunks.push(chunk));
        stream.on('end', () => done(null, Buffer.concat(chunks)));
      })
      .expect(200);
    const text = await readPdfText(res.body as Buffer);
    expect(text).toContain('Stitching order');
    expect(text).toContain('in border hooping');
    expect(text).toContain('60.1 mm (2 3/8 in) below the neckline');
    expect(text).toContain('87.7 mm (3 7/16 in) above the hem edge');
    expect(text).toContain('Rounded Block, capital letters 12 mm (1/2 in) tall');
    expect(text).toContain('Caution: Lies partly inside the sewing field of border hooping');
    expect(text).toContain('Stitching step 4.');
    expect(text).toContain('WB-107 Strawberry Patch');
  });

  it('when the studio has entered a stitch file for a placement, then the sheet names it; otherwise it says nothing', async () => {
    expect(placementOf(sheet, 'lamb').stitchFileName).toBeUndefined();
    const order = await harness.db('orders').where({ number: ORDER }).first('id');
    const staff = await harness.db('users').where({ role: 'staff' }).first('id');
    await harness.db('placement_stitch_files').insert({
      order_id: order.id,
      entered_by: staff.id,
      placement_id: 'lamb',
      stitch_count: 2704,
      colour_count: 3,
      file_name: 'rosie-lamb-90.dst',
    });
    const withFile = await fetchSheet();
    expect(placementOf(withFile, 'lamb').stitchFileName).toBe('rosie-lamb-90.dst');
    expect(placementOf(withFile, 'name').stitchFileName).toBeUndefined();
  });

  it('when the customer’s picture is a photo or scan, then its template prints the picture itself at its size', async () => {
    const harriet = await signedInAgent(harness, 'harriet@example.test');
    const uploaded = await uploadPlainPicture(harriet, { width: 80, height: 40 }, 0xc2253fff);
    await setPlacements([
      {
        id: 'scan',
        kind: 'artwork',
        zone: 'chest',
        centerXMm: CENTRE_FRONT_MM,
        centerYMm: 180,
        rotationDeg: 0,
        artworkUploadId: uploaded.id,
        widthMm: 50,
      },
    ]);
    const withScan = await fetchSheet();
    const template = withScan.templates.find((candidate) => candidate.placementId === 'scan')!;
    expect(template.pictureDataUrl).toMatch(/^data:image\/png;base64,/);
    expect(template.artwork.widthMm).toBeCloseTo(50, 6);
    expect(template.artwork.heightMm).toBeCloseTo(25, 6);
    expect(placementOf(withScan, 'scan').threads).toEqual([]);
    // pdfkit draws the picture into the template page.
    await staff.get(`${sheetPath}.pdf?paper=a4`).expect(200);
  });
});
