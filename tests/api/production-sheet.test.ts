import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { productionSheetResponse, type ProductionSheet } from '../../server/src/contracts/production-sheet.ts';
import { planHoopings } from '../../server/src/engine/index.ts';
import { templateArea, tileTemplate } from '../../server/src/modules/production/production-sheet-pdf-templates.ts';
import { useApiHarness, type ApiAgent } from '../support/api-harness.ts';
import { signedInAgent } from '../support/api-calls.ts';
import { readPdfPages, type PdfPage } from '../support/pdf-geometry.ts';

/** WB-1013 (seeds/data/orders.ts): the daisy chain round the 6-month bishop's 692 mm hem, in production. */
const WORKED_ORDER = 'WB-1013';
const sheetPath = (number: string) => `/api/admin/orders/${number}/production-sheet`;

const harness = useApiHarness();
let staff: ApiAgent;
beforeAll(async () => {
  staff = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
});

const binary = (res: request.Response, done: (error: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => done(null, Buffer.concat(chunks)));
};

async function fetchPdf(number: string, paper: string): Promise<Buffer> {
  const res = await staff
    .get(`${sheetPath(number)}.pdf?paper=${paper}`)
    .buffer(true)
    .parse(binary)
    .expect(200);
  expect(res.headers['content-type']).toBe('application/pdf');
  return res.body as Buffer;
}

const near = (actual: number, expected: number, tolerance = 0.01) => Math.abs(actual - expected) <= tolerance;
const hasSquare = (page: PdfPage, sidePt: number) =>
  page.paths.some((path) => near(path.widthPt, sidePt) && near(path.heightPt, sidePt));

describe('GET /api/admin/orders/:number/production-sheet', () => {
  let sheet: ProductionSheet;
  beforeAll(async () => {
    sheet = productionSheetResponse.parse((await staff.get(sheetPath(WORKED_ORDER)).expect(200)).body);
  });

  it('when staff open the worked case, then the hooping plan is the engine’s: 4 hoopings of one 173 mm repeat in the 120 × 180 hoop, centre first', () => {
    const border = sheet.placements.find((placement) => placement.kind === 'border')!;
    expect(border.hoop?.slug).toBe('oblong-120x180');
    expect(border.border).toMatchObject({
      count: 4,
      repeatWidthMm: 173,
      pitchMm: 173,
      runLengthMm: 692,
      isClosed: true,
      perHooping: 1,
    });
    // The engine's own plan for the same figures: 692 / 4 = 173 mm, the first centre half a repeat from the start.
    const engine = planHoopings({
      count: 4,
      repeatWidthMm: 173,
      pitchMm: 173,
      motifHeightMm: 40 * (173 / 180),
      hoop: { fieldWidthMm: 120, fieldHeightMm: 180 },
      firstCenterMm: 86.5,
    });
    expect(engine.ok).toBe(true);
    if (!engine.ok) return;
    expect(
      border.border!.hoopings.map((h) => ({
        order: h.order,
        repeats: h.repeatNumbers.map((n) => n - 1),
        side: h.side,
        fromRowStartMm: h.fromRowStartMm,
      })),
    ).toEqual(
      engine.hoopings.map((h) => ({
        order: h.order,
        repeats: h.repeatIndices,
        side: h.side,
        fromRowStartMm: h.centerMm,
      })),
    );
    expect(border.border!.hoopings[0].side).toBe('center');
  });

  it('when staff open a border of 4 hoopings, then the sheet says in words that they are sewn outwards from the centre mark, each beside sewn work', () => {
    const border = sheet.placements.find((placement) => placement.kind === 'border')!.border!;
    // Issue 11's rule: the two beside the centre mark first, left then right, then outwards (left first).
    expect(border.orderRule).toMatch(
      /^Stitch hooping 1 first: the one holding the centre mark or, when the mark falls/,
    );
    expect(border.orderRule).toContain('the left one first when two are equally near');
    expect(border.orderRule).toContain('From left to right the hoopings are numbered 3, 1, 2, 4.');
  });

  it('when the hoop centres are measured from the centre mark (the middle of the row, the centre front), then they sit at ±86.5 and ±259.5 mm', () => {
    const hoopings = sheet.placements.find((placement) => placement.kind === 'border')!.border!.hoopings;
    // 4 repeats of 173 mm: centres at 86.5, 259.5, 432.5 and 605.5 mm from the row's start; the middle is 346 mm.
    expect(hoopings.map((h) => h.fromCentreMm)).toEqual([-86.5, 86.5, -259.5, 259.5]);
    expect(hoopings.map((h) => h.fromRowStartMm - 346)).toEqual(hoopings.map((h) => h.fromCentreMm));
  });

  it('when the sheet lists threads, stabilizer, needle, run time and cautions, then each comes from the palette, the engine and the shop', async () => {
    const palette = new Map((await harness.db('threads').select('code', 'hex')).map((row) => [row.code, row.hex]));
    const threads = sheet.placements.flatMap((placement) => placement.threads);
    expect(threads.map((thread) => thread.code)).toEqual(['WB-118', 'WB-101', 'WB-103', 'WB-127', 'WB-102', 'WB-109']);
    for (const thread of threads) expect(thread.hex).toBe(palette.get(thread.code));
    // Woven lawn of medium density: tearaway, no topping; 75/11 sharp is the rule of thumb (common practice, no source).
    expect(sheet.stabilizer).toMatchObject({ backing: 'tearaway', topping: null });
    expect(sheet.needle).toMatchObject({ size: '75/11', point: 'sharp' });
    expect(sheet.runMinutes.totalMinutes).toBeGreaterThan(0);
    // The engine's garmentCautions for the youngest wearer (6 months): secure thread ends, check local rules.
    expect(sheet.cautions.map((caution) => caution.code)).toEqual(
      expect.arrayContaining(['caution.thread-ends', 'caution.local-rules']),
    );
    expect(sheet.templates.map((template) => template.placementId)).toEqual(['hem', 'lamb']);
    // Common practice, no source: the trade's worked case resizes a 180 mm motif to 173 mm for a 692 mm loop.
    expect(sheet.templates[0].artwork.widthMm).toBeCloseTo(173, 6);
    // The stem is a running-stitch line, drawn but not tinted; the petals and leaves are filled shapes.
    expect(new Set(sheet.templates[0].outlines.map((outline) => outline.isFilled))).toEqual(new Set([true, false]));
  });

  it('when the order has no approved proof yet, then it answers 409 with the reason', async () => {
    const res = await staff.get(sheetPath('WB-1008')).expect(409);
    expect(res.body.error.message).toMatch(/proof waiting for the customer’s answer/);
    await staff.get(`${sheetPath('WB-1010')}.pdf`).expect(409);
  });

  it('when the order does not exist, then it answers 404; when the paper is not letter or a4, then 400 naming the field', async () => {
    expect((await staff.get(sheetPath('WB-9999')).expect(404)).body.error.message).toBe('There is no order WB-9999.');
    await staff.get(`${sheetPath('WB-9999')}.pdf`).expect(404);
    const res = await staff.get(`${sheetPath(WORKED_ORDER)}.pdf?paper=legal`).expect(400);
    expect(res.body.error.fields.paper).toBe('Choose letter or a4');
  });

  it('when a customer or a signed-out visitor asks, then the sheet is refused (403, 401)', async () => {
    const customer = harness.agent();
    await harness.signIn(customer, 'harriet@example.test');
    await customer.get(sheetPath(WORKED_ORDER)).expect(403);
    await customer.get(`${sheetPath(WORKED_ORDER)}.pdf`).expect(403);
    await request(harness.app).get(sheetPath(WORKED_ORDER)).expect(401);
    await request(harness.app)
      .get(`${sheetPath(WORKED_ORDER)}.pdf?paper=a4`)
      .expect(401);
  });

  it('when the order is for two garments (WB-1004), then the order’s machine time counts both and the setup once', async () => {
    const twins = productionSheetResponse.parse((await staff.get(sheetPath('WB-1004')).expect(200)).body);
    expect(twins.order.quantity).toBe(2);
    const setup = twins.runMinutes.items.find((item) => item.code === 'setup')!.minutes;
    expect(twins.runMinutes.orderMinutes).toBeCloseTo(2 * twins.runMinutes.totalMinutes - setup, 6);
  });

  it('when every approved seeded order is opened, then each has a sheet', async () => {
    const numbers = (await harness
      .db('orders')
      .whereIn('status', ['proof_approved', 'in_production', 'stitched', 'shipped'])
      .pluck('number')) as string[];
    expect(numbers.length).toBeGreaterThanOrEqual(5);
    for (const number of numbers) productionSheetResponse.parse((await staff.get(sheetPath(number)).expect(200)).body);
  });
});

describe('GET /api/admin/orders/:number/production-sheet.pdf', () => {
  // 1 mm = 72/25.4 PDF units: PDF user space is 1/72 in (ISO 32000-1 §8.3.2.3) and 1 in = 25.4 mm (NIST SP 811).
  const checkSquarePt = (50 * 72) / 25.4; // 141.73
  const borderRepeatPt = (173 * 72) / 25.4; // 490.39

  it('when printed on Letter, then every page is 612 × 792 pt, each template page has a 141.73 pt check square and the border outline is 490.39 pt wide', async () => {
    const pages = await readPdfPages(await fetchPdf(WORKED_ORDER, 'letter'));
    // Letter is 8.5 × 11 in = 612 × 792 units (ISO 32000-1 §8.3.2.3; npm pdf-lib PageSizes.Letter).
    for (const page of pages) expect(page.view).toEqual([0, 0, 612, 792]);
    expect(checkSquarePt).toBeCloseTo(141.73, 2);
    expect(borderRepeatPt).toBeCloseTo(490.39, 2);
    const templatePages = pages.filter((page) => hasSquare(page, checkSquarePt));
    // The summary first, then one template for the border (all four hoopings alike) and one for the lamb.
    expect(templatePages).toHaveLength(2);
    expect(pages.slice(-2)).toEqual(templatePages);
    expect(hasSquare(pages[0], checkSquarePt)).toBe(false);
    // The daisy chain's stem runs the repeat's full width, so the widest outline piece is the 173 mm repeat.
    const outlineWidths = templatePages[0].paths.map((path) => path.widthPt);
    expect(outlineWidths.some((width) => near(width, borderRepeatPt))).toBe(true);
  });

  it('when a template is wider than the paper (WB-1003: 4 ducklings in the 160 × 260 hoop), then it prints as overlapping tiles, each with its check square', async () => {
    const sheet = productionSheetResponse.parse((await staff.get(sheetPath('WB-1003')).expect(200)).body);
    const area = templateArea('letter');
    const tiles = sheet.templates.flatMap((template) => tileTemplate(template, area));
    expect(tiles.length).toBeGreaterThan(sheet.templates.length);
    const pages = await readPdfPages(await fetchPdf('WB-1003', 'letter'));
    expect(pages.filter((page) => hasSquare(page, checkSquarePt))).toHaveLength(tiles.length);
  });

  it('when printed on A4, then every page is 595.28 × 841.89 pt and the check square is still 141.73 pt', async () => {
    const pages = await readPdfPages(await fetchPdf(WORKED_ORDER, 'a4'));
    // A4 is 210 × 297 mm (ISO 216) = 595.28 × 841.89 units (npm pdf-lib PageSizes.A4).
    for (const page of pages) {
      expect(page.view[2]).toBeCloseTo(595.28, 2);
      expect(page.view[3]).toBeCloseTo(841.89, 2);
    }
    expect(pages.filter((page) => hasSquare(page, checkSquarePt))).toHaveLength(2);
  });
});

describe('a production sheet for the customer’s own artwork', () => {
  it('when an order with an uploaded drawing is approved, then its sheet counts the drawing’s stitches from the customer’s upload', async () => {
    // WB-1009 carries Harriet's granddaughter's sun drawing (upload 1); approve it as the customer would.
    await harness.db('orders').where({ number: 'WB-1009' }).update({ status: 'proof_approved' });
    const sheet = productionSheetResponse.parse((await staff.get(sheetPath('WB-1009')).expect(200)).body);
    const drawing = sheet.placements.find((placement) => placement.kind === 'artwork');
    expect(drawing).toBeDefined();
    expect(drawing!.stitches).toBeGreaterThan(0);
    expect((await staff.get(`${sheetPath('WB-1009')}.pdf?paper=a4`).expect(200)).headers['content-type']).toMatch(
      /pdf/,
    );
  });
});
