import { beforeAll, describe, expect, it } from 'vitest';
import { apiErrorBody } from '../../server/src/contracts/errors.ts';
import type { DesignPlacement } from '../../server/src/contracts/designs.ts';
import {
  savedDesignListResponse,
  savedDesignResponse,
  type SaveDesignRequest,
} from '../../server/src/contracts/saved-designs.ts';
import { garments } from '../../seeds/data/garments.ts';
import { motifs } from '../../seeds/data/motifs.ts';
import { useApiHarness, fixedNow } from '../support/api-harness.ts';

const harness = useApiHarness();

const bishop = garments.find((garment) => garment.slug === 'bishop-dress')!;
const bib = garments.find((garment) => garment.slug === 'terry-bib')!;
const dress = garments.find((garment) => garment.slug === 'smocked-yoke-dress')!;
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
const nameOnChest: DesignPlacement = {
  id: 'name',
  kind: 'lettering',
  zone: 'chest',
  centerXMm: 230,
  centerYMm: 115,
  rotationDeg: 0,
  text: 'Mae',
  font: 'breezy-script',
  letterHeightMm: 20,
  thread: 'WB-110',
};

/** The 6-month bishop dress in Christening White with a daisy chain round the hem. */
const bishopWithDaisies: SaveDesignRequest = {
  garmentId: bishop.id,
  sizeId: bishop.sizes[0]!.id,
  colourId: bishop.colours[0]!.id,
  name: 'Daisies for the christening',
  document: { version: 1, placements: [daisyBorder] },
};

/** Seeded designs (seeds/data/designs.ts): Priya has 1–4 and 13; Harriet has 5–8, all in orders; 3 is in WB-1002. */
const priyasDesignIds = [13, 1, 4, 2, 3];
const harrietsDesignId = 6;
const priyasOrderedDesign = { id: 3, orderNumber: 'WB-1002' };

async function signedIn(email: string) {
  const agent = harness.agent();
  await harness.signIn(agent, email);
  return agent;
}

const errorOf = (body: unknown) => apiErrorBody.parse(body).error;
const designRow = (id: number) => harness.db('designs').where({ id }).first();

describe('anonymous access', () => {
  it.each([
    ['GET', '/api/designs'],
    ['POST', '/api/designs'],
    ['GET', '/api/designs/1'],
    ['PUT', '/api/designs/1'],
    ['DELETE', '/api/designs/1'],
  ])('when nobody is signed in, then %s %s answers 401', async (method, path) => {
    const agent = harness.agent();
    const call =
      method === 'GET'
        ? agent.get(path)
        : method === 'POST'
          ? agent.post(path)
          : method === 'PUT'
            ? agent.put(path)
            : agent.delete(path);
    const res = await call.send(bishopWithDaisies).expect(401);
    expect(errorOf(res.body).kind).toBe('unauthenticated');
  });
});

describe('GET /api/designs', () => {
  it('when Priya asks, then she gets only her own designs, the most recently changed first, each restored', async () => {
    const priya = await signedIn('priya@example.test');
    const { designs } = savedDesignListResponse.parse((await priya.get('/api/designs').expect(200)).body);
    expect(designs.map((design) => design.id)).toEqual(priyasDesignIds);
    expect(designs[1]).toMatchObject({ name: "Clara's birthday dress", document: { version: 1 } });
  });

  it("when staff ask, then they get their own designs (none), not the customers'", async () => {
    const tobias = await signedIn('tobias@wrenandbobbin.test');
    expect(savedDesignListResponse.parse((await tobias.get('/api/designs').expect(200)).body).designs).toEqual([]);
    await tobias.get('/api/designs/1').expect(404);
  });
});

describe('a saved design from start to finish', () => {
  it('when a customer creates, lists, reads, updates and deletes a design, then each step answers as the contract says', async () => {
    const priya = await signedIn('priya@example.test');
    const created = savedDesignResponse.parse(
      (await priya.post('/api/designs').send(bishopWithDaisies).expect(201)).body,
    ).design;
    const stamp = fixedNow().toISOString();
    expect(created).toMatchObject({
      name: bishopWithDaisies.name,
      garmentId: bishop.id,
      sizeId: bishopWithDaisies.sizeId,
      colourId: bishopWithDaisies.colourId,
      createdAt: stamp,
      updatedAt: stamp,
    });
    expect(created.document).toEqual(bishopWithDaisies.document);
    expect(await designRow(created.id)).toMatchObject({ customer_id: 3, document_version: 1 });

    const listed = savedDesignListResponse.parse((await priya.get('/api/designs').expect(200)).body).designs;
    expect(listed.map((design) => design.id)).toEqual([created.id, ...priyasDesignIds]);
    expect(savedDesignResponse.parse((await priya.get(`/api/designs/${created.id}`).expect(200)).body).design).toEqual(
      created,
    );

    const change = {
      ...bishopWithDaisies,
      name: 'Daisies and a name',
      document: { version: 1 as const, placements: [daisyBorder, nameOnChest] },
    };
    const updated = savedDesignResponse.parse(
      (await priya.put(`/api/designs/${created.id}`).send(change).expect(200)).body,
    ).design;
    expect(updated).toMatchObject({ id: created.id, name: 'Daisies and a name', createdAt: stamp });
    expect(updated.document).toEqual(change.document);

    await priya.delete(`/api/designs/${created.id}`).expect(204);
    expect(errorOf((await priya.get(`/api/designs/${created.id}`).expect(404)).body).message).toBe(
      `There is no design ${created.id}.`,
    );
    expect(await designRow(created.id)).toBeUndefined();
  });
});

describe("someone else's design", () => {
  it("when Priya reads, updates or deletes Harriet's design, then it answers exactly as a missing one and the row is unchanged", async () => {
    const priya = await signedIn('priya@example.test');
    const before = await designRow(harrietsDesignId);
    const missing = errorOf((await priya.get('/api/designs/999999').expect(404)).body);
    expect(missing).toEqual({ kind: 'not-found', message: 'There is no design 999999.' });

    expect(errorOf((await priya.get(`/api/designs/${harrietsDesignId}`).expect(404)).body)).toEqual({
      kind: 'not-found',
      message: `There is no design ${harrietsDesignId}.`,
    });
    expect(
      errorOf((await priya.put(`/api/designs/${harrietsDesignId}`).send(bishopWithDaisies).expect(404)).body).message,
    ).toBe(`There is no design ${harrietsDesignId}.`);
    // Harriet's design is in an order too; a 409 here would tell Priya that it exists.
    expect(errorOf((await priya.delete(`/api/designs/${harrietsDesignId}`).expect(404)).body).message).toBe(
      `There is no design ${harrietsDesignId}.`,
    );
    expect(await designRow(harrietsDesignId)).toEqual(before);
  });
});

describe('POST /api/designs checks', () => {
  let priya: Awaited<ReturnType<typeof signedIn>>;
  beforeAll(async () => {
    priya = await signedIn('priya@example.test');
  });
  const save = (body: unknown) => priya.post('/api/designs').send(body as object);

  it("when the size is another garment's, then it is refused with the size field", async () => {
    const res = await save({ ...bishopWithDaisies, sizeId: dress.sizes[0]!.id }).expect(400);
    expect(errorOf(res.body)).toMatchObject({ kind: 'invalid', fields: { sizeId: expect.stringMatching(/size/) } });
  });

  it("when the colour is another garment's, then it is refused with the colour field", async () => {
    const res = await save({ ...bishopWithDaisies, colourId: dress.colours[0]!.id }).expect(400);
    expect(errorOf(res.body)).toMatchObject({ kind: 'invalid', fields: { colourId: expect.stringMatching(/colour/) } });
  });

  it('when the garment is no longer on sale, then it is refused with the garment field', async () => {
    await harness.db('garments').where({ id: bishop.id }).update({ is_active: false });
    try {
      const res = await save(bishopWithDaisies).expect(400);
      expect(errorOf(res.body).fields).toHaveProperty('garmentId');
    } finally {
      await harness.db('garments').where({ id: bishop.id }).update({ is_active: true });
    }
  });

  it("when a border is put on a bib, which has no hem, then it is refused with the engine's reason", async () => {
    const res = await save({
      ...bishopWithDaisies,
      garmentId: bib.id,
      sizeId: bib.sizes[0]!.id,
      colourId: bib.colours[0]!.id,
    }).expect(400);
    expect(errorOf(res.body)).toMatchObject({
      kind: 'invalid',
      message: 'The Terry bib has no hem to take a border.',
      fields: { 'document.placements.0.zone': expect.any(String) },
    });
  });

  it('when a motif is not in the catalogue or a font is retired, then the placement naming it is refused', async () => {
    const unknownMotif = await save({
      ...bishopWithDaisies,
      document: { version: 1, placements: [{ ...daisyBorder, motif: 'unicorn-parade' }] },
    }).expect(400);
    expect(errorOf(unknownMotif.body).fields).toHaveProperty(['document.placements.0.motif']);
    // Ribbon Script is seeded inactive.
    const retiredFont = await save({
      ...bishopWithDaisies,
      document: { version: 1, placements: [daisyBorder, { ...nameOnChest, font: 'ribbon-script' }] },
    }).expect(400);
    expect(errorOf(retiredFont.body).fields).toHaveProperty(['document.placements.1.font']);
  });

  it('when the document carries a price or a stitch count, then it is refused rather than ignored', async () => {
    const withStitches = await save({
      ...bishopWithDaisies,
      document: { version: 1, placements: [{ ...daisyBorder, stitches: 12000 }] },
    }).expect(400);
    expect(errorOf(withStitches.body).fields!['document.placements.0']).toMatch(/Leave out stitches/);
    const withTotal = await save({
      ...bishopWithDaisies,
      document: { ...bishopWithDaisies.document, totalCents: 100 },
    }).expect(400);
    expect(errorOf(withTotal.body).fields!.document).toMatch(/Leave out totalCents/);
  });

  it('when the body is not JSON, then it answers 400', async () => {
    const res = await priya
      .post('/api/designs')
      .set('Content-Type', 'application/json')
      .send('{"garmentId": 3,')
      .expect(400);
    expect(errorOf(res.body)).toMatchObject({ kind: 'invalid', message: 'The request body is not valid JSON.' });
  });
});

describe('PUT /api/designs/:id checks', () => {
  it('when the update cannot be priced, then the stored design is left as it was', async () => {
    const priya = await signedIn('priya@example.test');
    const before = await designRow(1);
    await priya
      .put('/api/designs/1')
      .send({ ...bishopWithDaisies, sizeId: dress.sizes[0]!.id })
      .expect(400);
    expect(await designRow(1)).toEqual(before);
  });
});

describe('DELETE /api/designs/:id', () => {
  it('when the design is part of an order, then it is kept and the answer names the order', async () => {
    const priya = await signedIn('priya@example.test');
    const res = await priya.delete(`/api/designs/${priyasOrderedDesign.id}`).expect(409);
    expect(errorOf(res.body)).toEqual({
      kind: 'conflict',
      message: `This design is part of order ${priyasOrderedDesign.orderNumber}, so it is kept.`,
    });
    expect(await designRow(priyasOrderedDesign.id)).toBeDefined();
  });
});

describe('PUT /api/designs/:id on an ordered design', () => {
  it('when the design is part of an order, then it is kept exactly as ordered and the answer says how to change it', async () => {
    const priya = await signedIn('priya@example.test');
    const before = await designRow(priyasOrderedDesign.id);
    const res = await priya.put(`/api/designs/${priyasOrderedDesign.id}`).send(bishopWithDaisies).expect(409);
    expect(errorOf(res.body).message).toBe(
      `This design is part of order ${priyasOrderedDesign.orderNumber}, which is made exactly as ordered. Save your changes as a new design instead.`,
    );
    expect(await designRow(priyasOrderedDesign.id)).toEqual(before);
  });
});

describe('design ids', () => {
  it.each(['abc', '0', '-2', '1.5', '0x10', '1e2'])(
    'when the id is %s, then every route answers 400 for the id',
    async (id) => {
      const priya = await signedIn('priya@example.test');
      for (const res of [
        await priya.get(`/api/designs/${id}`),
        await priya.put(`/api/designs/${id}`).send(bishopWithDaisies),
        await priya.delete(`/api/designs/${id}`),
      ]) {
        expect(res.status).toBe(400);
        expect(errorOf(res.body).fields).toHaveProperty('id');
      }
    },
  );
});

describe('a stored document that no longer restores', () => {
  it('when it is read, then it is a server error, not a design sent on unchecked', async () => {
    const priya = await signedIn('priya@example.test');
    await harness
      .db('designs')
      .where({ id: 13 })
      .update({ document: JSON.stringify({ version: 1, placements: [{ kind: 'sparkles' }] }) });
    const res = await priya.get('/api/designs/13').expect(500);
    expect(errorOf(res.body).kind).toBe('server');
  });
});
