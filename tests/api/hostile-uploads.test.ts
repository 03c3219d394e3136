import { beforeAll, describe, expect, it } from 'vitest';
import { artworkUploadResponse } from '../../server/src/contracts/artwork.ts';
import { motifPreviewResponse } from '../../server/src/contracts/admin-catalogue-motifs.ts';
import { quotePreviewResponse } from '../../server/src/contracts/quotes.ts';
import { estimateStitches } from '../../server/src/engine/index.ts';
import { artworkDressQuote } from '../support/sample-designs.ts';
import { useApiHarness, type ApiAgent } from '../support/api-harness.ts';
import { errorOf, signedInAgent } from '../support/api-calls.ts';
import {
  externalReferenceCases,
  jpegDeclaring,
  OUTSIDE_HOST,
  pngDeclaring,
  sameDocumentReferences,
  svgDocument,
  svgWithPathSegments,
} from '../support/hostile-files.ts';

const harness = useApiHarness();

const upload = (agent: ApiAgent, bytes: Buffer | string, filename: string, contentType = 'image/svg+xml') =>
  agent
    .post('/api/artwork')
    .attach('file', Buffer.isBuffer(bytes) ? bytes : Buffer.from(bytes), { filename, contentType });

const flower = svgDocument(
  '<circle cx="50" cy="50" r="30" fill="#f4a6c0"/><path d="M10 90 H90" stroke="#2e241e" stroke-width="2" fill="none"/>',
);

const withArtwork = artworkDressQuote;

describe('POST /api/artwork: pictures that declare more pixels than they hold', () => {
  it('when a 45-byte PNG declares 20,000 × 20,000 px, then it is refused as too large from its header, naming the limit', async () => {
    const bomb = pngDeclaring(20_000, 20_000);
    expect(bomb.length).toBeLessThan(80);
    const res = await upload(harness.agent(), bomb, 'tiny.png', 'image/png').expect(413);
    expect(errorOf(res.body)).toMatchObject({
      kind: 'too-large',
      message: 'That picture is 20,000 × 20,000 px (400 megapixels); please upload one under 25 megapixels.',
      fields: { file: expect.stringMatching(/under 25 megapixels/) },
    });
  });

  it('when a JPEG header declares 30,000 × 30,000 px, then it is refused the same way', async () => {
    const res = await upload(harness.agent(), jpegDeclaring(30_000, 30_000), 'tiny.jpg', 'image/jpeg').expect(413);
    expect(errorOf(res.body).message).toMatch(/^That picture is 30,000 × 30,000 px \(900 megapixels\)/);
  });

  it('when the server refuses a pixel bomb, then it keeps answering other requests', async () => {
    const bombs = Array.from({ length: 3 }, () =>
      upload(harness.agent(), pngDeclaring(20_000, 20_000), 'tiny.png', 'image/png'),
    );
    const [health, ...refused] = await Promise.all([harness.agent().get('/api/health'), ...bombs]);
    expect(health.status).toBe(200);
    expect(refused.map((res) => res.status)).toEqual([413, 413, 413]);
  });
});

describe('POST /api/artwork: SVG sizes', () => {
  it('when an SVG says it is 99,999,999,999 px wide, then it answers 400 with the limit in words', async () => {
    const wide = svgDocument('<rect width="10" height="10"/>', 'width="99999999999" height="100"');
    const res = await upload(harness.agent(), wide, 'wide.svg').expect(400);
    expect(errorOf(res.body)).toMatchObject({
      kind: 'invalid',
      message:
        'The SVG says it is 99,999,999,999 × 100 px; an SVG may be at most 10,000 px on each side, so give it a smaller width, height or viewBox.',
    });
  });

  it('when an SVG has viewBox="0 0 1e12 1e12", then it answers 400 with the limit in words', async () => {
    const huge = svgDocument('<rect width="10" height="10"/>', 'viewBox="0 0 1e12 1e12"');
    const res = await upload(harness.agent(), huge, 'huge.svg').expect(400);
    expect(errorOf(res.body).message).toBe(
      "The SVG's viewBox holds 1,000,000,000,000; keep each of its numbers within 1,000,000 units.",
    );
  });
});

describe('POST /api/artwork: external references', () => {
  it.each(externalReferenceCases)(
    'when an SVG carries $name, then the stored and served copy does not',
    async ({ body }) => {
      const agent = harness.agent();
      const res = await upload(agent, svgDocument(`${body}${sameDocumentReferences}`), 'drawing.svg').expect(201);
      const { artwork } = artworkUploadResponse.parse(res.body);
      const row = await harness.db('artwork_uploads').where({ id: artwork.id }).first();
      expect(row.sanitized_svg).not.toContain(OUTSIDE_HOST);
      expect(row.sanitized_svg).not.toMatch(/@import|image-set/i);
      // Same-document references are drawing, not fetching: they stay.
      expect(row.sanitized_svg).toContain('url(#sun)');
      expect(row.sanitized_svg).toContain('href="#dot"');
      const served = await agent.get(artwork.imageUrl).expect(200);
      expect(String(served.text ?? served.body)).not.toContain(OUTSIDE_HOST);
    },
  );

  it('when an SVG holds an inline PNG as a data: picture in a style, then it stays', async () => {
    const inline = '<rect width="10" height="10" style="fill: url(data:image/png;base64,iVBORw0KGgo=)"/>';
    const res = await upload(harness.agent(), svgDocument(inline), 'inline.svg').expect(201);
    const row = await harness
      .db('artwork_uploads')
      .where({ id: artworkUploadResponse.parse(res.body).artwork.id })
      .first();
    expect(row.sanitized_svg).toContain('url(data:image/png;base64,iVBORw0KGgo=)');
  });
});

describe('POST /api/admin/catalogue/motifs/preview: external references', () => {
  let staff: ApiAgent;
  beforeAll(async () => {
    staff = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
  });

  it.each(externalReferenceCases)('when a motif SVG carries $name, then the preview does not', async ({ body }) => {
    const motif = svgDocument(`${body}${sameDocumentReferences}`, 'width="40mm" height="40mm" viewBox="0 0 100 100"');
    const res = await staff
      .post('/api/admin/catalogue/motifs/preview')
      .attach('file', Buffer.from(motif), { filename: 'motif.svg', contentType: 'image/svg+xml' })
      .expect(200);
    const preview = motifPreviewResponse.parse(res.body);
    expect(preview.svg).not.toContain(OUTSIDE_HOST);
    expect(preview.svg).toContain('url(#sun)');
  });
});

describe('POST /api/artwork: malformed multipart', () => {
  it('when the multipart body has no boundary, then it answers 400 with a sentence', async () => {
    const res = await harness
      .agent()
      .post('/api/artwork')
      .set('Content-Type', 'multipart/form-data')
      .send('--x\r\nContent-Disposition: form-data; name="file"; filename="a.svg"\r\n\r\n<svg/>\r\n--x--\r\n')
      .expect(400);
    expect(errorOf(res.body)).toEqual({
      kind: 'invalid',
      message:
        'The upload could not be read: the form data is malformed or was cut off. Choose the file and send it again.',
    });
  });

  it('when the multipart body is cut off part-way through the file, then it answers 400 with a sentence', async () => {
    const res = await harness
      .agent()
      .post('/api/artwork')
      .set('Content-Type', 'multipart/form-data; boundary=cut')
      .send(
        '--cut\r\nContent-Disposition: form-data; name="file"; filename="a.svg"\r\nContent-Type: image/svg+xml\r\n\r\n<svg xmlns',
      )
      .expect(400);
    expect(errorOf(res.body).message).toMatch(/^The upload could not be read/);
  });
});

describe('POST /api/artwork: the visitor cap under parallel uploads', () => {
  it('when a visitor sends 20 uploads at once, then exactly 10 are kept and the rest are refused with the cap message', async () => {
    const visitor = harness.agent();
    // The first upload gives the visitor their session; the burst then all comes from that one visitor.
    await upload(visitor, flower, 'first.svg').expect(201);
    const burst = await Promise.all(Array.from({ length: 20 }, (_, n) => upload(visitor, flower, `drawing-${n}.svg`)));
    const statuses = burst.map((res) => res.status);
    expect(statuses.filter((status) => status === 201)).toHaveLength(9);
    expect(statuses.filter((status) => status === 409)).toHaveLength(11);
    const { artworks } = (await visitor.get('/api/artwork').expect(200)).body;
    expect(artworks).toHaveLength(10);
  });
});

describe('POST /api/artwork: huge paths and stored stitch figures', () => {
  it('when an SVG path has 50,000 segments, then it is refused with the segment limit in words', async () => {
    const res = await upload(harness.agent(), svgWithPathSegments(50_000), 'scribble.svg').expect(400);
    expect(errorOf(res.body).message).toBe(
      "Your artwork can't be measured for stitching: The artwork's paths have 50,001 segments; 20,000 at most can be measured, so simplify the paths (fewer nodes) and upload it again.",
    );
  });

  it('when an SVG has 6,000 elements, then it is refused with the element limit in words', async () => {
    const crowd = svgDocument(
      Array.from({ length: 6_000 }, (_, i) => `<rect x="${i % 100}" width="1" height="1"/>`).join(''),
    );
    const res = await upload(harness.agent(), crowd, 'crowd.svg').expect(400);
    expect(errorOf(res.body).message).toMatch(/has 6,001 elements; 5,000 at most can be measured/);
  });

  it('when an SVG path is M0 0H1e200V1e200H0Z, then the upload is refused with a reason, not stored with infinite stitches', async () => {
    const res = await upload(
      harness.agent(),
      svgDocument('<path d="M0 0H1e200V1e200H0Z" fill="#000"/>'),
      'vast.svg',
    ).expect(400);
    expect(errorOf(res.body).message).toMatch(/^Your artwork can't be measured for stitching: .*too large to measure/);
  });

  it('when an SVG is uploaded, then its stitch figures are stored with it and quotes are counted from them, not from the drawing again', async () => {
    const agent = harness.agent();
    const { artwork } = artworkUploadResponse.parse((await upload(agent, flower, 'flower.svg').expect(201)).body);
    const row = await harness.db('artwork_uploads').where({ id: artwork.id }).first();
    const figures = JSON.parse(row.stitch_figures);
    expect(figures).toMatchObject({ version: 1, shapes: [{ kind: 'fill' }, { kind: 'stroke' }] });
    const expected = estimateStitches({ kind: 'svg', svgText: row.sanitized_svg, size: { widthMm: 60 } });
    if (!expected.ok) throw new Error(expected.reason);

    // Were the drawing parsed again, this would change the count; the stored figures keep it.
    await harness
      .db('artwork_uploads')
      .where({ id: artwork.id })
      .update({ sanitized_svg: svgDocument('') });
    const quote = quotePreviewResponse.parse(
      (await agent.post('/api/quotes/preview').send(withArtwork(artwork.id, 60)).expect(200)).body,
    );
    expect(quote.placements[0]).toMatchObject({ stitches: expected.stitches, colourChanges: expected.colorChanges });
  });
});
