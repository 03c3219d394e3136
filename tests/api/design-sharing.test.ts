import { describe, expect, it } from 'vitest';
import { designShareResponse, sharedDesignResponse } from '../../server/src/contracts/design-sharing.ts';
import { savedDesignListResponse, savedDesignResponse } from '../../server/src/contracts/saved-designs.ts';
import { demoPeople } from '../../seeds/data/people.ts';
import { useApiHarness, fixedNow } from '../support/api-harness.ts';
import { callFor, errorOf, signedInAgent } from '../support/api-calls.ts';

const harness = useApiHarness();

/** Seeded designs (seeds/data/designs.ts): Priya has 1–4 and 13, of which 3 is in order WB-1002; Harriet has 5–8. */
const priyasDesignId = 1;
const priyasOrderedDesign = { id: 3, orderNumber: 'WB-1002' };
const harrietsDesignId = 6;

const signedIn = (email: string) => signedInAgent(harness, email);
const designRow = (id: number) => harness.db('designs').where({ id }).first();

describe('anonymous access', () => {
  it.each([
    ['POST', '/api/designs/1/duplicate'],
    ['PATCH', '/api/designs/1'],
    ['POST', '/api/designs/1/share'],
    ['DELETE', '/api/designs/1/share'],
  ] as const)('when nobody is signed in, then %s %s answers 401', async (method, path) => {
    const res = await callFor(harness.agent(), method, path).send({ name: 'Mine now' }).expect(401);
    expect(errorOf(res.body).kind).toBe('unauthenticated');
  });
});

describe('POST /api/designs/:id/duplicate', () => {
  it('when Priya duplicates her own design, then a new design of hers holds the same garment and document, named as a copy', async () => {
    const priya = await signedIn('priya@example.test');
    const original = savedDesignResponse.parse(
      (await priya.get(`/api/designs/${priyasDesignId}`).expect(200)).body,
    ).design;
    const copy = savedDesignResponse.parse(
      (await priya.post(`/api/designs/${priyasDesignId}/duplicate`).expect(201)).body,
    ).design;
    expect(copy.id).not.toBe(original.id);
    expect(copy).toMatchObject({
      name: `${original.name} (copy)`,
      garmentId: original.garmentId,
      sizeId: original.sizeId,
      colourId: original.colourId,
      shareToken: null,
      createdAt: fixedNow().toISOString(),
    });
    expect(copy.document).toEqual(original.document);
    expect(await designRow(copy.id)).toMatchObject({ customer_id: (await designRow(priyasDesignId)).customer_id });
    const listed = savedDesignListResponse.parse((await priya.get('/api/designs').expect(200)).body).designs;
    expect(listed[0]!.id).toBe(copy.id);
  });

  it('when the design is part of an order, then the copy is a free design of its own that can be changed and deleted', async () => {
    const priya = await signedIn('priya@example.test');
    const copy = savedDesignResponse.parse(
      (await priya.post(`/api/designs/${priyasOrderedDesign.id}/duplicate`).expect(201)).body,
    ).design;
    await priya.patch(`/api/designs/${copy.id}`).send({ name: 'Try it in blue' }).expect(200);
    await priya.delete(`/api/designs/${copy.id}`).expect(204);
  });

  it("when the name is already long, then the copy's name is shortened to fit 80 characters and still says it is a copy", async () => {
    const priya = await signedIn('priya@example.test');
    await priya
      .patch(`/api/designs/${priyasDesignId}`)
      .send({ name: 'A'.repeat(80) })
      .expect(200);
    const copy = savedDesignResponse.parse(
      (await priya.post(`/api/designs/${priyasDesignId}/duplicate`).expect(201)).body,
    ).design;
    expect(copy.name).toBe(`${'A'.repeat(73)} (copy)`);
  });

  it("when Priya duplicates Harriet's design, then it answers as a missing one and nothing is saved", async () => {
    const priya = await signedIn('priya@example.test');
    const [{ count: before }] = await harness.db('designs').count({ count: '*' });
    const res = await priya.post(`/api/designs/${harrietsDesignId}/duplicate`).expect(404);
    expect(errorOf(res.body)).toEqual({ kind: 'not-found', message: `There is no design ${harrietsDesignId}.` });
    const [{ count: after }] = await harness.db('designs').count({ count: '*' });
    expect(after).toBe(before);
  });

  it('when the id is not a number, then it answers 400 with the reason', async () => {
    const priya = await signedIn('priya@example.test');
    const res = await priya.post('/api/designs/abc/duplicate').expect(400);
    expect(errorOf(res.body)).toMatchObject({ kind: 'invalid', fields: { id: 'must be a design number' } });
  });
});

describe('PATCH /api/designs/:id (rename)', () => {
  it('when Priya renames her ordered design, then only its name changes: the document stays as ordered', async () => {
    const priya = await signedIn('priya@example.test');
    const before = await designRow(priyasOrderedDesign.id);
    const renamed = savedDesignResponse.parse(
      (await priya.patch(`/api/designs/${priyasOrderedDesign.id}`).send({ name: '  Party dress  ' }).expect(200)).body,
    ).design;
    expect(renamed.name).toBe('Party dress');
    const after = await designRow(priyasOrderedDesign.id);
    expect(after.document).toEqual(before.document);
  });

  it('when the name is empty, too long or sent with other fields, then it is refused with a message for the field', async () => {
    const priya = await signedIn('priya@example.test');
    expect(
      errorOf((await priya.patch(`/api/designs/${priyasDesignId}`).send({ name: '   ' }).expect(400)).body).fields,
    ).toEqual({ name: 'Give the design a name' });
    expect(
      errorOf(
        (
          await priya
            .patch(`/api/designs/${priyasDesignId}`)
            .send({ name: 'x'.repeat(81) })
            .expect(400)
        ).body,
      ).fields,
    ).toEqual({ name: 'Keep the name to 80 characters' });
    const extra = errorOf(
      (await priya.patch(`/api/designs/${priyasDesignId}`).send({ name: 'Ok', document: {} }).expect(400)).body,
    );
    expect(extra.message).toMatch(/Leave out document/);
  });

  it("when Priya renames Harriet's design, then it answers as a missing one and the name is unchanged", async () => {
    const priya = await signedIn('priya@example.test');
    const before = await designRow(harrietsDesignId);
    await priya.patch(`/api/designs/${harrietsDesignId}`).send({ name: 'Mine now' }).expect(404);
    expect(await designRow(harrietsDesignId)).toEqual(before);
  });
});

describe('sharing a design by link', () => {
  it('when Priya shares her design, then the link opens it read-only for anyone, with no customer details, and again gives the same link', async () => {
    const priya = await signedIn('priya@example.test');
    const before = await designRow(priyasDesignId);
    const { shareToken } = designShareResponse.parse(
      (await priya.post(`/api/designs/${priyasDesignId}/share`).expect(200)).body,
    );
    expect(shareToken).toMatch(/^[A-Za-z0-9_-]{24}$/);
    expect(
      designShareResponse.parse((await priya.post(`/api/designs/${priyasDesignId}/share`).expect(200)).body).shareToken,
    ).toBe(shareToken);
    // Sharing is not an edit: the list keeps the order of the customer's changes.
    expect((await designRow(priyasDesignId)).updated_at).toEqual(before.updated_at);
    const mine = savedDesignResponse.parse((await priya.get(`/api/designs/${priyasDesignId}`).expect(200)).body).design;
    expect(mine.shareToken).toBe(shareToken);

    const visitor = harness.agent();
    const res = await visitor.get(`/api/shared-designs/${shareToken}`).expect(200);
    const { design } = sharedDesignResponse.parse(res.body);
    expect(design).toEqual({
      name: mine.name,
      garmentId: mine.garmentId,
      sizeId: mine.sizeId,
      colourId: mine.colourId,
      document: mine.document,
      // The pictures of its uploads (none here), fetched through the link.
      uploads: [],
    });
    // Nothing that names or numbers the customer, nor the design's own id and dates.
    expect(Object.keys(res.body.design).sort()).toEqual([
      'colourId',
      'document',
      'garmentId',
      'name',
      'sizeId',
      'uploads',
    ]);
    const priyaPerson = demoPeople.find((person) => person.email === 'priya@example.test')!;
    const text = JSON.stringify(res.body);
    for (const secret of [priyaPerson.email, priyaPerson.name, priyaPerson.familyName, 'customer'])
      expect(text).not.toContain(secret);
  });

  it('when Priya stops sharing, then the link answers 404 for everyone, and sharing again makes a new link', async () => {
    const priya = await signedIn('priya@example.test');
    const { shareToken } = designShareResponse.parse(
      (await priya.post(`/api/designs/${priyasDesignId}/share`).expect(200)).body,
    );
    await priya.delete(`/api/designs/${priyasDesignId}/share`).expect(204);
    const gone = await harness.agent().get(`/api/shared-designs/${shareToken}`).expect(404);
    expect(errorOf(gone.body)).toEqual({
      kind: 'not-found',
      message: 'This link does not open a design: its owner may have stopped sharing it.',
    });
    expect((await designRow(priyasDesignId)).share_token).toBeNull();
    // Switching off an unshared design is not an error.
    await priya.delete(`/api/designs/${priyasDesignId}/share`).expect(204);

    const again = designShareResponse.parse(
      (await priya.post(`/api/designs/${priyasDesignId}/share`).expect(200)).body,
    ).shareToken;
    expect(again).not.toBe(shareToken);
    await harness.agent().get(`/api/shared-designs/${shareToken}`).expect(404);
    await harness.agent().get(`/api/shared-designs/${again}`).expect(200);
  });

  it("when Priya shares or unshares Harriet's design, then it answers as a missing one and Harriet's design stays unshared", async () => {
    const priya = await signedIn('priya@example.test');
    expect(errorOf((await priya.post(`/api/designs/${harrietsDesignId}/share`).expect(404)).body).message).toBe(
      `There is no design ${harrietsDesignId}.`,
    );
    expect(errorOf((await priya.delete(`/api/designs/${harrietsDesignId}/share`).expect(404)).body).message).toBe(
      `There is no design ${harrietsDesignId}.`,
    );
    expect((await designRow(harrietsDesignId)).share_token).toBeNull();
  });

  it('when Harriet has shared her design, then Priya can view it by link but cannot stop sharing it or open it as her own', async () => {
    const harriet = await signedIn('harriet@example.test');
    const { shareToken } = designShareResponse.parse(
      (await harriet.post(`/api/designs/${harrietsDesignId}/share`).expect(200)).body,
    );
    const priya = await signedIn('priya@example.test');
    await priya.get(`/api/shared-designs/${shareToken}`).expect(200);
    await priya.delete(`/api/designs/${harrietsDesignId}/share`).expect(404);
    await priya.get(`/api/designs/${harrietsDesignId}`).expect(404);
    expect((await designRow(harrietsDesignId)).share_token).toBe(shareToken);
  });

  it('when a link code is malformed or unknown, then it answers 400 or 404 without revealing anything', async () => {
    const visitor = harness.agent();
    expect(errorOf((await visitor.get('/api/shared-designs/not%20a%20code').expect(400)).body).fields).toEqual({
      token: 'must be the code from a shared link',
    });
    expect(errorOf((await visitor.get(`/api/shared-designs/${'Z'.repeat(24)}`).expect(404)).body).kind).toBe(
      'not-found',
    );
  });

  it('when a shared design is deleted, then its link answers 404', async () => {
    const priya = await signedIn('priya@example.test');
    const copy = savedDesignResponse.parse(
      (await priya.post(`/api/designs/${priyasDesignId}/duplicate`).expect(201)).body,
    ).design;
    const { shareToken } = designShareResponse.parse(
      (await priya.post(`/api/designs/${copy.id}/share`).expect(200)).body,
    );
    await priya.delete(`/api/designs/${copy.id}`).expect(204);
    await harness.agent().get(`/api/shared-designs/${shareToken}`).expect(404);
  });
});
