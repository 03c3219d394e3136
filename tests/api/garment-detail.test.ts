import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { garmentDetailResponse, motifListResponse } from '../../server/src/contracts/catalogue.ts';
import { apiErrorBody } from '../../server/src/contracts/errors.ts';
import { motifs } from '../../seeds/data/motifs.ts';
import { sizeMeasurements } from '../../seeds/data/garment-measurements.ts';
import { useApiHarness } from '../support/api-harness.ts';

const harness = useApiHarness();

const detailOf = async (slug: string) =>
  garmentDetailResponse.parse((await request(harness.app).get(`/api/catalogue/garments/${slug}`).expect(200)).body)
    .garment;

describe('GET /api/catalogue/garments/:slug', () => {
  it("when anyone asks for a garment, then it comes with a back drawing on the front drawing's viewBox and each size measured", async () => {
    const bishop = await detailOf('bishop-dress');
    expect(bishop.mockupBackSvg).toContain('viewBox="0 0 460 470"');
    expect(bishop.mockupBackSvg).toContain('<title>Bishop dress, back</title>');
    expect(bishop.mockupSvg).toContain('viewBox="0 0 460 470"');
    expect(bishop.sizes.map((size) => [size.code, size.chestMm, size.lengthMm])).toEqual([
      ['6m', 470, 400],
      ['12m', 490, 430],
      ['18m', 510, 460],
      ['2T', 530, 490],
      ['3T', 550, 520],
    ]);
    expect(bishop.sizes[0]).toMatchObject({ hemFrontMm: 346, hemCircumferenceMm: 692 });
  });

  it('when a measurement does not apply, then it is null rather than zero: a bonnet has no chest or length, a bib only a length', async () => {
    const bonnet = await detailOf('sun-bonnet');
    expect(bonnet.sizes.every((size) => size.chestMm === null && size.lengthMm === null)).toBe(true);
    const bib = await detailOf('terry-bib');
    expect(bib.sizes.map((size) => size.lengthMm)).toEqual(
      [401, 402, 403, 404].map((id) => sizeMeasurements[id]!.lengthMm),
    );
    expect(bib.sizes.every((size) => size.chestMm === null)).toBe(true);
  });

  it('when the garment is not on offer or unknown, then it answers 404; a malformed name answers 400', async () => {
    await harness.db('garments').where({ slug: 'sun-bonnet' }).update({ is_active: false });
    try {
      const res = await request(harness.app).get('/api/catalogue/garments/sun-bonnet').expect(404);
      expect(apiErrorBody.parse(res.body).error).toEqual({
        kind: 'not-found',
        message: 'There is no garment “sun-bonnet” on offer.',
      });
    } finally {
      await harness.db('garments').where({ slug: 'sun-bonnet' }).update({ is_active: true });
    }
    await request(harness.app).get('/api/catalogue/garments/no-such-thing').expect(404);
    const bad = await request(harness.app).get('/api/catalogue/garments/Not_A_Slug').expect(400);
    expect(apiErrorBody.parse(bad.body).error.fields).toEqual({ slug: 'must be a garment name from the catalogue' });
  });
});

describe('GET /api/catalogue/motifs', () => {
  it('when anyone asks, then each motif carries its measured stitch count at 100 %', async () => {
    const listed = motifListResponse.parse(
      (await request(harness.app).get('/api/catalogue/motifs').expect(200)).body,
    ).motifs;
    for (const motif of listed) {
      const seeded = motifs.find((candidate) => candidate.slug === motif.slug)!;
      expect(motif.stitchCount, motif.slug).toBe(seeded.run + seeded.satin + seeded.fill);
    }
  });
});
