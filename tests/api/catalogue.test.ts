import { describe, expect, it } from 'vitest';
import request from 'supertest';
import {
  fontListResponse,
  garmentListResponse,
  motifListResponse,
  threadListResponse,
} from '../../server/src/contracts/catalogue.ts';
import { studioCatalogueResponse } from '../../server/src/contracts/admin-catalogue.ts';
import { fitBorder } from '../../server/src/engine/index.ts';
import { useApiHarness } from '../support/api-harness.ts';

const harness = useApiHarness();

describe('GET /api/catalogue/garments', () => {
  it('when anyone asks, then the active garments come with their sizes and colours, matching the contract', async () => {
    const res = await request(harness.app).get('/api/catalogue/garments').expect(200);
    const { garments } = garmentListResponse.parse(res.body);
    expect(garments.length).toBeGreaterThanOrEqual(4);
    for (const garment of garments) {
      expect(garment.sizes.length).toBeGreaterThanOrEqual(4);
      expect(garment.colours.length).toBeGreaterThanOrEqual(3);
    }
  });

  it('when a browser that accepts gzip asks, then the list comes compressed, and a short answer does not', async () => {
    const res = await request(harness.app).get('/api/catalogue/garments').set('Accept-Encoding', 'gzip').expect(200);
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(garmentListResponse.parse(res.body).garments.length).toBeGreaterThanOrEqual(4);
    const health = await request(harness.app).get('/api/health').set('Accept-Encoding', 'gzip').expect(200);
    expect(health.headers['content-encoding']).toBeUndefined();
  });

  it('when a garment takes no hem border, then its hem lengths are null rather than zero', async () => {
    const { garments } = garmentListResponse.parse((await request(harness.app).get('/api/catalogue/garments')).body);
    const bib = garments.find((garment) => garment.kind === 'bib')!;
    expect(bib.sizes.every((size) => size.hemCircumferenceMm === null)).toBe(true);
  });

  it('when anyone asks, then every size has its placement zones and mockup scale, and hem sizes a hem zone 1¾ in up', async () => {
    const { garments } = garmentListResponse.parse((await request(harness.app).get('/api/catalogue/garments')).body);
    for (const size of garments.flatMap((garment) => garment.sizes)) {
      expect(size.zones.length, size.code).toBeGreaterThanOrEqual(1);
      expect(size.mockupScale).toBeGreaterThan(0);
      const hem = size.zones.find((zone) => zone.code === 'hem');
      // 1¾ in = 44.45 mm: where a hem border's centre line commonly sits (common practice, no source).
      if (size.hemFrontMm !== null) expect(hem?.hemOffsetMm, size.code).toBe(44.45);
      else expect(hem).toBeUndefined();
    }
    const dress = garments.find((garment) => garment.slug === 'smocked-yoke-dress')!;
    expect(dress.sizes.find((size) => size.code === '2T')!.mockupScale).toBe(1);
  });

  it("when a garment is listed, then its mockup size is the drawing's viewBox in mm", async () => {
    const { garments } = garmentListResponse.parse((await request(harness.app).get('/api/catalogue/garments')).body);
    const bib = garments.find((garment) => garment.kind === 'bib')!;
    expect(bib.mockupSvg).toContain('viewBox="0 0 240 300"');
    expect({ widthMm: bib.mockupWidthMm, heightMm: bib.mockupHeightMm }).toEqual({ widthMm: 240, heightMm: 300 });
  });

  it('when a drawing has no viewBox, then its mockup size comes from its width and height in mm', async () => {
    const bib = await harness.db('garments').select('id', 'mockup_svg').where({ slug: 'terry-bib' }).first();
    const withoutViewBox = (bib.mockup_svg as string)
      .replace(/\sviewBox="[^"]*"/, '')
      .replace('width="240mm"', 'width="241.5mm"');
    await harness.db('garments').where({ id: bib.id }).update({ mockup_svg: withoutViewBox });
    try {
      const { garments } = garmentListResponse.parse(
        (await request(harness.app).get('/api/catalogue/garments').expect(200)).body,
      );
      const listed = garments.find((garment) => garment.id === bib.id)!;
      expect({ widthMm: listed.mockupWidthMm, heightMm: listed.mockupHeightMm }).toEqual({
        widthMm: 241.5,
        heightMm: 300,
      });
    } finally {
      await harness.db('garments').where({ id: bib.id }).update({ mockup_svg: bib.mockup_svg });
    }
  });
});

describe('GET /api/catalogue/motifs', () => {
  it('when anyone asks, then the active motifs come borders first, with numeric sizes and resize limits', async () => {
    const res = await request(harness.app).get('/api/catalogue/motifs').expect(200);
    const { motifs } = motifListResponse.parse(res.body);
    expect(motifs.length).toBeGreaterThanOrEqual(6);
    expect(motifs[0]!.kind).toBe('border');
    expect(motifs.findIndex((m) => m.kind === 'single')).toBeGreaterThan(
      motifs.findLastIndex((m) => m.kind === 'border'),
    );
    expect(motifs.every((m) => m.svg.startsWith('<svg') && m.minScalePct <= 100 && m.maxScalePct >= 100)).toBe(true);
  });

  it('when the 180 mm border meets the 692 mm hem of the seeded 6-month bishop dress, then 4 repeats of 173 mm fit', async () => {
    // The trade's worked case (common practice, no source): 692 mm loop, 180 mm motif allowed 90–110 % → 4 × 173 mm.
    const [garments, motifs] = await Promise.all([
      request(harness.app)
        .get('/api/catalogue/garments')
        .then((r) => garmentListResponse.parse(r.body).garments),
      request(harness.app)
        .get('/api/catalogue/motifs')
        .then((r) => motifListResponse.parse(r.body).motifs),
    ]);
    const size = garments.flatMap((g) => g.sizes).find((s) => s.hemCircumferenceMm === 692)!;
    const motif = motifs.find((m) => m.widthMm === 180)!;
    const fit = fitBorder({
      runLengthMm: size.hemCircumferenceMm!,
      closed: true,
      motifWidthMm: motif.widthMm,
      gapMm: motif.gapMm,
      minScale: motif.minScalePct / 100,
      maxScale: motif.maxScalePct / 100,
    });
    expect(fit).toMatchObject({ ok: true, count: 4 });
    expect(fit.ok && fit.repeatWidthMm).toBeCloseTo(173, 6);
  });
});

describe('GET /api/catalogue/fonts', () => {
  it('when anyone asks, then the active lettering fonts come in display order with their letter heights', async () => {
    const { fonts } = fontListResponse.parse((await request(harness.app).get('/api/catalogue/fonts').expect(200)).body);
    expect(fonts.map((font) => font.slug)).toEqual(['breezy-script', 'rounded-block', 'heirloom-serif']);
    expect(fonts[0]).toMatchObject({ name: 'Breezy Script', fontFamily: 'Pacifico', minHeightMm: 10, maxHeightMm: 60 });
  });
});

describe('GET /api/catalogue/threads', () => {
  it('when anyone asks, then the whole active palette comes in display order', async () => {
    const { threads } = threadListResponse.parse(
      (await request(harness.app).get('/api/catalogue/threads').expect(200)).body,
    );
    expect(threads.length).toBeGreaterThanOrEqual(30);
    expect(threads[0]).toEqual({ code: 'WB-101', name: 'Chalk White', hex: '#F7F5EE' });
    expect(threads.every((thread) => /^#[0-9A-F]{6}$/.test(thread.hex))).toBe(true);
  });

  it('when the studio retires a thread, then it is no longer offered', async () => {
    await harness.db('threads').where({ code: 'WB-102' }).update({ is_active: false });
    try {
      const { threads } = threadListResponse.parse(
        (await request(harness.app).get('/api/catalogue/threads').expect(200)).body,
      );
      expect(threads.map((thread) => thread.code)).not.toContain('WB-102');
      expect(threads.map((thread) => thread.code)).toContain('WB-101');
    } finally {
      await harness.db('threads').where({ code: 'WB-102' }).update({ is_active: true });
    }
  });
});

describe('GET /api/admin/catalogue', () => {
  it('when a customer asks, then it is refused', async () => {
    const agent = harness.agent();
    await harness.signIn(agent, 'priya@example.test');
    await agent.get('/api/admin/catalogue').expect(403);
  });

  it('when staff ask, then motifs come with their measured stitch mix and the threads, hoops and fonts', async () => {
    const agent = harness.agent();
    await harness.signIn(agent, 'tobias@wrenandbobbin.test');
    const body = studioCatalogueResponse.parse((await agent.get('/api/admin/catalogue').expect(200)).body);
    expect(body.threads.length).toBeGreaterThanOrEqual(30);
    expect(body.hoops.map((h) => `${h.fieldWidthMm}×${h.fieldHeightMm}`)).toEqual(
      expect.arrayContaining(['100×100', '120×180']),
    );
    expect(body.fonts.filter((f) => f.isActive).length).toBeGreaterThanOrEqual(3);
    for (const motif of body.motifs) {
      expect(motif.mix.run + motif.mix.satin + motif.mix.fill).toBe(motif.stitchCount);
      expect(motif.threadCodes).toHaveLength(motif.colourCount);
    }
  });
});
