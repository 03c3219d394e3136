import { beforeAll, describe, expect, it } from 'vitest';
import { converter } from 'culori';
import { apiErrorBody } from '../../server/src/contracts/errors.ts';
import {
  motifListResponse,
  garmentListResponse,
  threadListResponse,
  fontListResponse,
} from '../../server/src/contracts/catalogue.ts';
import { studioCatalogueResponse } from '../../server/src/contracts/admin-catalogue.ts';
import { studioGarmentListResponse } from '../../server/src/contracts/admin-catalogue-garments.ts';
import { motifPreviewResponse, type CreateMotifRequest } from '../../server/src/contracts/admin-catalogue-motifs.ts';
import { shippedFontListResponse } from '../../server/src/contracts/admin-catalogue-fonts.ts';
import { garments } from '../../seeds/data/garments.ts';
import { useApiHarness, type ApiAgent } from '../support/api-harness.ts';
import { signedInAgent } from '../support/api-calls.ts';

const harness = useApiHarness();
let staff: ApiAgent;
let customer: ApiAgent;
beforeAll(async () => {
  staff = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
  customer = await signedInAgent(harness, 'priya@example.test');
});

const errorOf = (body: unknown) => apiErrorBody.parse(body).error;
const studioCatalogue = async () =>
  studioCatalogueResponse.parse((await staff.get('/api/admin/catalogue').expect(200)).body);
const studioGarments = async () =>
  studioGarmentListResponse.parse((await staff.get('/api/admin/catalogue/garments').expect(200)).body).garments;

/** A filled 1 in × 1 in square, as in the engine's own test of fill stitches per in². */
const squareInch =
  '<svg xmlns="http://www.w3.org/2000/svg" width="1in" height="1in" viewBox="0 0 1 1"><rect width="1" height="1" fill="#204080"/></svg>';
const hostileSvg =
  '<svg xmlns="http://www.w3.org/2000/svg" width="40mm" height="20mm" viewBox="0 0 40 20" onload="alert(1)"><script>alert(2)</script><rect x="2" y="2" width="36" height="16" fill="#D04040" onclick="steal()"/></svg>';
/** The 8-byte PNG signature and an IHDR chunk header: enough for the type sniffer to call it a PNG. */
const pngBytes = Buffer.from('89504e470d0a1a0a0000000d4948445200000001000000010806000000', 'hex');

function uploadPreview(
  agent: ApiAgent,
  content: Buffer | string,
  name = 'motif.svg',
  fields: Record<string, string> = {},
) {
  let call = agent.post('/api/admin/catalogue/motifs/preview');
  for (const [key, value] of Object.entries(fields)) call = call.field(key, value);
  return call.attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content), {
    filename: name,
    contentType: 'image/svg+xml',
  });
}

const newMotif = (overrides: Partial<CreateMotifRequest> = {}): CreateMotifRequest => ({
  slug: 'rosy-square',
  trims: [],
  name: 'Rosy square',
  kind: 'single',
  svg: squareInch,
  widthMm: 25.4,
  heightMm: 25.4,
  gapMm: 0,
  minScalePct: 80,
  maxScalePct: 120,
  threadCodes: ['WB-101'],
  measured: null,
  ...overrides,
});

describe('who may change the catalogue', () => {
  it.each([
    ['POST', '/api/admin/catalogue/hoops'],
    ['POST', '/api/admin/catalogue/threads'],
    ['POST', '/api/admin/catalogue/motifs/preview'],
    ['POST', '/api/admin/catalogue/motifs/1/retire'],
    ['PUT', '/api/admin/catalogue/garments/1'],
    ['GET', '/api/admin/catalogue/garments'],
    ['GET', '/api/admin/catalogue/fonts/shipped'],
  ])('when a customer calls %s %s, then it answers 403', async (method, path) => {
    const call = method === 'GET' ? customer.get(path) : method === 'PUT' ? customer.put(path) : customer.post(path);
    const res = await call.send({}).expect(403);
    expect(errorOf(res.body).kind).toBe('forbidden');
  });

  it('when nobody is signed in, then a catalogue change answers 401', async () => {
    await harness.agent().post('/api/admin/catalogue/hoops').send({}).expect(401);
  });
});

describe('hoops', () => {
  it('when staff add, edit, retire and reactivate a hoop, then the catalogue shows each change', async () => {
    const created = await staff
      .post('/api/admin/catalogue/hoops')
      .send({ slug: 'round-150', name: 'Round 150', fieldWidthMm: 150, fieldHeightMm: 150 })
      .expect(201);
    const id = created.body.id as number;
    await staff
      .put(`/api/admin/catalogue/hoops/${id}`)
      .send({ name: 'Round 150 mm', fieldWidthMm: 148, fieldHeightMm: 149.5 })
      .expect(200);
    expect((await studioCatalogue()).hoops.find((h) => h.id === id)).toMatchObject({
      name: 'Round 150 mm',
      fieldWidthMm: 148,
      fieldHeightMm: 149.5,
      isActive: true,
    });
    expect((await staff.post(`/api/admin/catalogue/hoops/${id}/retire`).expect(200)).body).toEqual({
      id,
      isActive: false,
    });
    expect((await studioCatalogue()).hoops.find((h) => h.id === id)?.isActive).toBe(false);
    await staff.post(`/api/admin/catalogue/hoops/${id}/reactivate`).expect(200);
    expect((await studioCatalogue()).hoops.find((h) => h.id === id)?.isActive).toBe(true);
  });

  it('when staff add a hoop without a clearance and then set one, then it starts at the 3 mm default and keeps the edit', async () => {
    const created = await staff
      .post('/api/admin/catalogue/hoops')
      .send({ slug: 'round-130', name: 'Round 130', fieldWidthMm: 130, fieldHeightMm: 130 })
      .expect(201);
    const id = created.body.id as number;
    expect((await studioCatalogue()).hoops.find((h) => h.id === id)).toMatchObject({ clearanceMm: 3 });
    await staff
      .put(`/api/admin/catalogue/hoops/${id}`)
      .send({ name: 'Round 130', fieldWidthMm: 130, fieldHeightMm: 130, clearanceMm: 4.5 })
      .expect(200);
    expect((await studioCatalogue()).hoops.find((h) => h.id === id)).toMatchObject({ clearanceMm: 4.5 });
    // An edit that leaves the clearance out keeps it.
    await staff
      .put(`/api/admin/catalogue/hoops/${id}`)
      .send({ name: 'Round 130 mm', fieldWidthMm: 130, fieldHeightMm: 130 })
      .expect(200);
    expect((await studioCatalogue()).hoops.find((h) => h.id === id)).toMatchObject({ clearanceMm: 4.5 });
    const tooMuch = await staff
      .put(`/api/admin/catalogue/hoops/${id}`)
      .send({ name: 'Round 130 mm', fieldWidthMm: 40, fieldHeightMm: 130, clearanceMm: 20 })
      .expect(400);
    expect(errorOf(tooMuch.body).fields).toEqual({
      clearanceMm: 'The clearance at both edges must be less than the field’s shorter side',
    });
  });

  it('when the short name is taken, then it answers 409 naming the field', async () => {
    const res = await staff
      .post('/api/admin/catalogue/hoops')
      .send({ slug: 'square-100', name: 'Again', fieldWidthMm: 100, fieldHeightMm: 100 })
      .expect(409);
    expect(errorOf(res.body)).toMatchObject({
      kind: 'conflict',
      fields: { slug: 'Another hoop already uses this short name' },
    });
  });

  it('when the field is zero and the slug has capitals, then it answers 400 with both fields', async () => {
    const res = await staff
      .post('/api/admin/catalogue/hoops')
      .send({ slug: 'Big Hoop', name: 'Big', fieldWidthMm: 0, fieldHeightMm: 100 })
      .expect(400);
    expect(Object.keys(errorOf(res.body).fields!)).toEqual(expect.arrayContaining(['slug', 'fieldWidthMm']));
  });

  it('when the hoop does not exist, then editing it answers 404', async () => {
    await staff
      .put('/api/admin/catalogue/hoops/9999')
      .send({ name: 'Ghost', fieldWidthMm: 100, fieldHeightMm: 100 })
      .expect(404);
  });
});

describe('threads', () => {
  it('when a thread is added with only a hex, then its CIELAB is the one culori 4.0.2 gives for that hex under D65', async () => {
    const created = await staff
      .post('/api/admin/catalogue/threads')
      .send({ code: 'WB-900', name: 'Kingfisher', hex: '#1a8fb0' })
      .expect(201);
    const row = await harness.db('threads').where({ id: created.body.id }).first();
    // Source: the culori library (npm culori 4.0.2), converter('lab65'), the conversion the seeds use too.
    const expected = converter('lab65')('#1A8FB0')!;
    expect(row.hex).toBe('#1A8FB0');
    expect(Number(row.lab_l)).toBeCloseTo(expected.l, 3);
    expect(Number(row.lab_a)).toBeCloseTo(expected.a, 3);
    expect(Number(row.lab_b)).toBeCloseTo(expected.b, 3);
  });

  it('when a thread comes with measured CIELAB, then that is kept as given', async () => {
    const created = await staff
      .post('/api/admin/catalogue/threads')
      .send({ code: 'WB-901', name: 'Measured moss', hex: '#6E9A4E', lab: { l: 59.1, a: -22.5, b: 30.2 } })
      .expect(201);
    const row = await harness.db('threads').where({ id: created.body.id }).first();
    expect([Number(row.lab_l), Number(row.lab_a), Number(row.lab_b)]).toEqual([59.1, -22.5, 30.2]);
  });

  it('when a thread is edited and retired, then the storefront palette loses it and the studio still lists it', async () => {
    const created = await staff
      .post('/api/admin/catalogue/threads')
      .send({ code: 'WB-902', name: 'Plum', hex: '#5B2A5E' })
      .expect(201);
    await staff
      .put(`/api/admin/catalogue/threads/${created.body.id}`)
      .send({ name: 'Deep plum', hex: '#4B1A4E' })
      .expect(200);
    await staff.post(`/api/admin/catalogue/threads/${created.body.id}/retire`).expect(200);
    const palette = threadListResponse.parse((await harness.agent().get('/api/catalogue/threads')).body).threads;
    expect(palette.some((t) => t.code === 'WB-902')).toBe(false);
    expect((await studioCatalogue()).threads.find((t) => t.code === 'WB-902')).toMatchObject({
      name: 'Deep plum',
      hex: '#4B1A4E',
      isActive: false,
    });
  });

  it('when the code is taken or the hex is not a colour, then it answers 409 or 400 with the field', async () => {
    const taken = await staff
      .post('/api/admin/catalogue/threads')
      .send({ code: 'WB-101', name: 'Twin', hex: '#FFFFFF' })
      .expect(409);
    expect(errorOf(taken.body).fields).toEqual({ code: 'Another thread already has this code' });
    const bad = await staff
      .post('/api/admin/catalogue/threads')
      .send({ code: 'WB-903', name: 'Odd', hex: 'pink' })
      .expect(400);
    expect(errorOf(bad.body).fields?.hex).toMatch(/six hex digits/);
  });
});

describe('lettering fonts', () => {
  it('when staff ask which fonts ship, then the four lettering fonts come back, all in the catalogue, and Poppins is not one', async () => {
    const { fonts } = shippedFontListResponse.parse(
      (await staff.get('/api/admin/catalogue/fonts/shipped').expect(200)).body,
    );
    expect(fonts.map((f) => f.fontsourcePackage)).toEqual([
      '@fontsource/fredoka',
      '@fontsource/great-vibes',
      '@fontsource/pacifico',
      '@fontsource/playfair-display',
    ]);
    expect(fonts.every((f) => f.isInCatalogue)).toBe(true);
  });

  it('when a font is retired, then the storefront stops offering it; reactivated, it is back', async () => {
    const font = (await studioCatalogue()).fonts.find((f) => f.slug === 'rounded-block')!;
    await staff.post(`/api/admin/catalogue/fonts/${font.id}/retire`).expect(200);
    const offered = async () =>
      fontListResponse.parse((await harness.agent().get('/api/catalogue/fonts')).body).fonts.map((f) => f.slug);
    expect(await offered()).not.toContain('rounded-block');
    await staff.post(`/api/admin/catalogue/fonts/${font.id}/reactivate`).expect(200);
    expect(await offered()).toContain('rounded-block');
  });

  it('when the heights are edited, then they are kept; when the largest is below the smallest, then 400 on maxHeightMm', async () => {
    const font = (await studioCatalogue()).fonts.find((f) => f.slug === 'rounded-block')!;
    await staff
      .put(`/api/admin/catalogue/fonts/${font.id}`)
      .send({ name: 'Rounded Block', minHeightMm: 12, maxHeightMm: 50 })
      .expect(200);
    expect((await studioCatalogue()).fonts.find((f) => f.id === font.id)).toMatchObject({
      minHeightMm: 12,
      maxHeightMm: 50,
    });
    const res = await staff
      .put(`/api/admin/catalogue/fonts/${font.id}`)
      .send({ name: 'Rounded Block', minHeightMm: 40, maxHeightMm: 20 })
      .expect(400);
    expect(errorOf(res.body).fields).toHaveProperty('maxHeightMm');
  });

  it('when a font is not shipped with the shop, then adding it answers 400 on fontsourcePackage', async () => {
    const res = await staff
      .post('/api/admin/catalogue/fonts')
      .send({
        slug: 'interface',
        fontsourcePackage: '@fontsource/poppins',
        name: 'Interface',
        minHeightMm: 8,
        maxHeightMm: 40,
      })
      .expect(400);
    expect(errorOf(res.body).fields?.fontsourcePackage).toMatch(/not shipped/);
  });

  it('when a shipped font is added under a new short name, then the server fills in its family and file', async () => {
    const res = await staff
      .post('/api/admin/catalogue/fonts')
      .send({
        slug: 'garden-party',
        fontsourcePackage: '@fontsource/pacifico',
        name: 'Garden Party',
        minHeightMm: 12,
        maxHeightMm: 50,
      })
      .expect(201);
    const row = await harness.db('lettering_fonts').where({ id: res.body.id }).first();
    expect(row).toMatchObject({ font_family: 'Pacifico', file_name: 'pacifico-latin-400-normal.woff' });
  });
});

describe('garments, sizes and fabric colours', () => {
  const mockup =
    '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 300 400" onload="x()"><path d="M10 10 H290 V390 H10 Z" fill="#fff" stroke="#333"/></svg>';
  const garment = {
    slug: 'pinafore',
    name: 'Linen pinafore',
    kind: 'dress',
    description: 'A simple pinafore with a wide hem.',
    fabricType: 'woven',
    isNapped: false,
    minAgeMonths: 12,
    maxAgeMonths: 48,
    mockupSvg: mockup,
  };
  const size = {
    code: '3T',
    label: '3 years',
    minAgeMonths: 36,
    maxAgeMonths: 48,
    hemFrontMm: 300,
    hemCircumferenceMm: 620,
    mockupScale: 1,
    zones: [{ code: 'hem', label: 'Hem', xMm: 10, yMm: 330, widthMm: 280, heightMm: 60, hemOffsetMm: 44.45 }],
  };

  it('when staff add a garment with a size and a colour, then the storefront lists it with its sanitized drawing', async () => {
    const created = await staff.post('/api/admin/catalogue/garments').send(garment).expect(201);
    const id = created.body.id as number;
    await staff.post(`/api/admin/catalogue/garments/${id}/sizes`).send(size).expect(201);
    await staff.post(`/api/admin/catalogue/garments/${id}/colours`).send({ name: 'Oat', hex: '#e8dcc4' }).expect(201);
    const listed = garmentListResponse
      .parse((await harness.agent().get('/api/catalogue/garments')).body)
      .garments.find((g) => g.id === id)!;
    expect(listed.mockupSvg).not.toMatch(/onload/);
    expect(listed).toMatchObject({
      mockupWidthMm: 300,
      mockupHeightMm: 400,
      colours: [{ name: 'Oat', hex: '#E8DCC4' }],
    });
    expect(listed.sizes[0]).toMatchObject({
      code: '3T',
      hemFrontMm: 300,
      zones: [{ code: 'hem', hemOffsetMm: 44.45 }],
    });
  });

  it('when a garment is edited and retired, then the storefront drops it and the studio keeps it, marked hidden', async () => {
    const id = (await studioGarments()).find((g) => g.slug === 'pinafore')!.id;
    await staff
      .put(`/api/admin/catalogue/garments/${id}`)
      .send({ ...garment, mockupSvg: undefined, name: 'Linen pinafore dress', isNapped: true })
      .expect(200);
    await staff.post(`/api/admin/catalogue/garments/${id}/retire`).expect(200);
    const storefront = garmentListResponse.parse((await harness.agent().get('/api/catalogue/garments')).body).garments;
    expect(storefront.some((g) => g.id === id)).toBe(false);
    expect((await studioGarments()).find((g) => g.id === id)).toMatchObject({
      name: 'Linen pinafore dress',
      isNapped: true,
      isActive: false,
    });
  });

  it('when a size or colour no design uses is deleted, then it is gone; one an order uses answers 409 and stays', async () => {
    const pinafore = (await studioGarments()).find((g) => g.slug === 'pinafore')!;
    await staff.delete(`/api/admin/catalogue/garments/${pinafore.id}/colours/${pinafore.colours[0]!.id}`).expect(200);
    await staff.delete(`/api/admin/catalogue/garments/${pinafore.id}/sizes/${pinafore.sizes[0]!.id}`).expect(200);
    expect((await studioGarments()).find((g) => g.id === pinafore.id)).toMatchObject({ sizes: [], colours: [] });

    // Seeded design 3 (Priya's bib, order WB-1002) is made in the terry bib's medium size.
    const bib = (await studioGarments()).find((g) => g.slug === 'terry-bib')!;
    const medium = bib.sizes.find((s) => s.code === 'medium')!;
    expect(medium.isInUse).toBe(true);
    const res = await staff.delete(`/api/admin/catalogue/garments/${bib.id}/sizes/${medium.id}`).expect(409);
    expect(errorOf(res.body).message).toMatch(/used by saved designs or orders/);
    expect((await studioGarments()).find((g) => g.id === bib.id)!.sizes.some((s) => s.id === medium.id)).toBe(true);
  });

  it('when a size and a colour are edited, then the storefront shows the new hem, zones and swatch', async () => {
    const dress = (await studioGarments()).find((g) => g.slug === 'smocked-yoke-dress')!;
    const [size, colour] = [dress.sizes.at(-1)!, dress.colours.at(-1)!];
    const zones = [
      ...size.zones.filter((zone) => zone.code !== 'hem'),
      { code: 'hem', label: 'Hem', xMm: 5, yMm: 300, widthMm: 290, heightMm: 70, hemOffsetMm: 38.1 },
    ];
    await staff
      .put(`/api/admin/catalogue/garments/${dress.id}/sizes/${size.id}`)
      .send({
        code: size.code,
        label: size.label,
        minAgeMonths: size.minAgeMonths,
        maxAgeMonths: 66,
        hemFrontMm: 545,
        hemCircumferenceMm: 1090,
        mockupScale: size.mockupScale,
        zones,
      })
      .expect(200);
    await staff
      .put(`/api/admin/catalogue/garments/${dress.id}/colours/${colour.id}`)
      .send({ name: 'Sea Glass', hex: '#a8d5c9' })
      .expect(200);
    const listed = garmentListResponse
      .parse((await harness.agent().get('/api/catalogue/garments')).body)
      .garments.find((g) => g.id === dress.id)!;
    expect(listed.sizes.find((s) => s.id === size.id)).toMatchObject({
      hemFrontMm: 545,
      hemCircumferenceMm: 1090,
      maxAgeMonths: 66,
    });
    expect(listed.sizes.find((s) => s.id === size.id)!.zones.find((zone) => zone.code === 'hem')?.hemOffsetMm).toBe(
      38.1,
    );
    expect(listed.colours.find((c) => c.id === colour.id)).toMatchObject({ name: 'Sea Glass', hex: '#A8D5C9' });
  });

  it('when a size or colour is addressed under another garment, then it answers 404 and nothing changes', async () => {
    const [dress, bib] = ['smocked-yoke-dress', 'terry-bib'].map((slug) => garments.find((g) => g.slug === slug)!);
    await staff
      .put(`/api/admin/catalogue/garments/${bib.id}/colours/${dress.colours[0]!.id}`)
      .send({ name: 'Stolen', hex: '#000000' })
      .expect(404);
    await staff.delete(`/api/admin/catalogue/garments/${bib.id}/sizes/${dress.sizes[0]!.id}`).expect(404);
    await staff
      .post('/api/admin/catalogue/garments/9999/colours')
      .send({ name: 'Nowhere', hex: '#000000' })
      .expect(404);
  });

  it('when a size has one hem length, a hem zone without its distance and a duplicate code, then 400 names each field', async () => {
    const dress = garments.find((g) => g.slug === 'smocked-yoke-dress')!;
    const bad = { ...size, hemCircumferenceMm: null, zones: [{ ...size.zones[0], hemOffsetMm: undefined }] };
    const res = await staff.post(`/api/admin/catalogue/garments/${dress.id}/sizes`).send(bad).expect(400);
    expect(Object.keys(errorOf(res.body).fields!)).toEqual(
      expect.arrayContaining(['hemCircumferenceMm', 'zones.0.hemOffsetMm']),
    );
    const taken = await staff
      .post(`/api/admin/catalogue/garments/${dress.id}/sizes`)
      .send({ ...size, code: dress.sizes[0]!.code })
      .expect(409);
    expect(errorOf(taken.body).fields).toHaveProperty('code');
  });

  it('when a garment drawing has no size or the ages run backwards, then 400 on that field', async () => {
    const noBox = await staff
      .post('/api/admin/catalogue/garments')
      .send({
        ...garment,
        slug: 'no-box',
        mockupSvg: '<svg xmlns="http://www.w3.org/2000/svg" width="50%"><rect/></svg>',
      })
      .expect(400);
    expect(errorOf(noBox.body).fields).toHaveProperty('mockupSvg');
    const ages = await staff
      .post('/api/admin/catalogue/garments')
      .send({ ...garment, slug: 'ages', minAgeMonths: 30, maxAgeMonths: 6 })
      .expect(400);
    expect(errorOf(ages.body).fields).toHaveProperty('maxAgeMonths');
  });
});

describe('POST /api/admin/catalogue/motifs/preview', () => {
  it('when a filled 1 in² square is uploaded, then the estimate has 807 fill stitches before underlay and its size is 25.4 mm', async () => {
    const res = await uploadPreview(staff, squareInch).expect(200);
    const preview = motifPreviewResponse.parse(res.body);
    // 645.16 mm² / (0.2 mm rows × 4 mm stitches) = 806.45 → 807, before underlay: the engine's check against the
    // seminar table of 710–1,030 fill stitches per in² (chholderby.com "Estimating Stitches").
    expect(preview.estimate!.mix.fill).toBe(807);
    expect(preview.estimate!.underlay).toBeGreaterThan(0);
    expect(preview.estimate!.stitchCount).toBe(807 + preview.estimate!.underlay);
    expect(preview.widthMm).toBeCloseTo(25.4, 9);
    expect(preview.heightMm).toBeCloseTo(25.4, 9);
    expect(preview.colours).toEqual([{ hex: '#204080', threadCode: expect.any(String) }]);
  });

  it('when the drawing gives no absolute size, then there is no estimate until a width is sent', async () => {
    const unsized =
      '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 10 10"><rect width="10" height="10" fill="#204080"/></svg>';
    const first = motifPreviewResponse.parse((await uploadPreview(staff, unsized).expect(200)).body);
    expect(first).toMatchObject({
      widthMm: null,
      estimate: null,
      estimateMessage: expect.stringMatching(/width in millimetres/),
    });
    const sized = motifPreviewResponse.parse(
      (await uploadPreview(staff, unsized, 'motif.svg', { widthMm: '25.4' }).expect(200)).body,
    );
    expect(sized.estimate!.mix.fill).toBe(807);
    expect(sized.heightMm).toBeCloseTo(25.4, 9);
  });

  it('when an SVG carries a <script> and onload, then the preview comes back without them', async () => {
    const preview = motifPreviewResponse.parse((await uploadPreview(staff, hostileSvg).expect(200)).body);
    expect(preview.svg).not.toMatch(/script|onload|onclick|alert/i);
    expect(preview.svg).toContain('<rect');
  });

  it('when a PNG is sent named .svg, then it answers 415', async () => {
    const res = await uploadPreview(staff, pngBytes, 'sneaky.svg').expect(415);
    expect(errorOf(res.body).kind).toBe('unsupported-type');
  });

  it('when the file is larger than the upload limit, then it answers 413', async () => {
    const big = `<svg xmlns="http://www.w3.org/2000/svg" width="10mm" height="10mm"><!--${'x'.repeat(harness.config.uploadMaxBytes)}--></svg>`;
    const res = await uploadPreview(staff, big).expect(413);
    expect(errorOf(res.body).kind).toBe('too-large');
  });

  it('when no file is sent, then it answers 400 on file', async () => {
    const res = await staff.post('/api/admin/catalogue/motifs/preview').field('widthMm', '20').expect(400);
    expect(errorOf(res.body).fields).toEqual({ file: 'Choose an SVG file' });
  });
});

describe('motifs', () => {
  it('when a motif is saved without a measured count, then quotes use the estimate and it is marked as the source', async () => {
    const res = await staff.post('/api/admin/catalogue/motifs').send(newMotif()).expect(201);
    const row = await harness.db('motifs').where({ id: res.body.id }).first();
    expect(row).toMatchObject({
      stitch_count_source: 'estimate',
      fill_stitches: row.estimated_fill_stitches,
      run_stitches: 0,
    });
    // 807 top stitches plus the underlay, all under the fill.
    expect(row.fill_stitches).toBeGreaterThan(807);
    expect(row.stitch_count).toBe(row.run_stitches + row.satin_stitches + row.fill_stitches);
    const listed = motifListResponse.parse((await harness.agent().get('/api/catalogue/motifs')).body).motifs;
    expect(listed.some((m) => m.slug === 'rosy-square')).toBe(true);
  });

  it('when the studio enters its measured count, then that is used, split like the estimate, and the estimate is kept', async () => {
    const res = await staff
      .post('/api/admin/catalogue/motifs')
      .send(newMotif({ slug: 'measured-square', measured: { stitchCount: 1200 } }))
      .expect(201);
    const row = await harness.db('motifs').where({ id: res.body.id }).first();
    expect(row).toMatchObject({ stitch_count_source: 'measured', stitch_count: 1200, fill_stitches: 1200 });
    expect(row.estimated_fill_stitches).toBeGreaterThan(807);
    const studio = (await studioCatalogue()).motifs.find((m) => m.slug === 'measured-square')!;
    expect(studio).toMatchObject({
      stitchCountSource: 'measured',
      stitchCount: 1200,
      estimatedMix: { run: 0, satin: 0, fill: row.estimated_fill_stitches },
    });
  });

  it('when a measured mix does not add up, then it answers 400 on measured.mix', async () => {
    const res = await staff
      .post('/api/admin/catalogue/motifs')
      .send(newMotif({ slug: 'odd-mix', measured: { stitchCount: 1000, mix: { run: 100, satin: 100, fill: 100 } } }))
      .expect(400);
    expect(errorOf(res.body).fields).toHaveProperty(['measured.mix']);
  });

  it('when an SVG with <script> and onload is saved, then it is stored without them', async () => {
    const res = await staff
      .post('/api/admin/catalogue/motifs')
      .send(newMotif({ slug: 'hostile', svg: hostileSvg, widthMm: 40, heightMm: 20 }))
      .expect(201);
    const row = await harness.db('motifs').where({ id: res.body.id }).first();
    expect(row.svg).not.toMatch(/script|onload|onclick|alert/i);
    expect(row.svg).toContain('<rect');
  });

  it('when the slug is taken, a thread is unknown or the scale range is inverted, then 409 or 400 names the field', async () => {
    const taken = await staff
      .post('/api/admin/catalogue/motifs')
      .send(newMotif({ slug: 'daisy-chain' }))
      .expect(409);
    expect(errorOf(taken.body).fields).toEqual({ slug: 'Another motif already uses this short name' });
    const thread = await staff
      .post('/api/admin/catalogue/motifs')
      .send(newMotif({ slug: 'no-thread', threadCodes: ['WB-101', 'NOPE-1'] }))
      .expect(400);
    expect(errorOf(thread.body).fields).toEqual({ 'threadCodes.1': 'There is no thread NOPE-1 on the shelf' });
    const scale = await staff
      .post('/api/admin/catalogue/motifs')
      .send(newMotif({ slug: 'bad-scale', minScalePct: 120, maxScalePct: 90 }))
      .expect(400);
    expect(Object.keys(errorOf(scale.body).fields!)).toEqual(expect.arrayContaining(['minScalePct', 'maxScalePct']));
  });

  it('when a motif is edited, then the new figures and threads are kept', async () => {
    const id = (await studioCatalogue()).motifs.find((m) => m.slug === 'rosy-square')!.id;
    await staff
      .put(`/api/admin/catalogue/motifs/${id}`)
      .send({ ...newMotif(), slug: undefined, name: 'Rosy tile', threadCodes: ['WB-110'], maxScalePct: 150 })
      .expect(200);
    expect((await studioCatalogue()).motifs.find((m) => m.id === id)).toMatchObject({
      name: 'Rosy tile',
      threadCodes: ['WB-110'],
      maxScalePct: 150,
    });
  });

  it('when a motif an ordered design uses is retired, then the storefront drops it but the design and its order still open', async () => {
    // Seeded design 3 (Priya's bib, in order WB-1002) has the sitting bunny on it.
    const bunny = (await studioCatalogue()).motifs.find((m) => m.slug === 'sitting-bunny')!;
    await staff.post(`/api/admin/catalogue/motifs/${bunny.id}/retire`).expect(200);
    const listed = motifListResponse.parse((await harness.agent().get('/api/catalogue/motifs')).body).motifs;
    expect(listed.some((m) => m.slug === 'sitting-bunny')).toBe(false);
    const design = await customer.get('/api/designs/3').expect(200);
    expect(JSON.stringify(design.body.design.document)).toContain('sitting-bunny');
    await staff.get('/api/admin/orders/WB-1002').expect(200);
    expect(await harness.db('motifs').where({ id: bunny.id }).first()).toMatchObject({ is_active: 0 });
    await staff.post(`/api/admin/catalogue/motifs/${bunny.id}/reactivate`).expect(200);
  });

  it('when anyone tries to delete a motif, then there is no such route: motifs are retired, not deleted', async () => {
    await staff.delete('/api/admin/catalogue/motifs/1').expect(404);
  });
});
