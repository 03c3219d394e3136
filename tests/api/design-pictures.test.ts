import { beforeAll, describe, expect, it } from 'vitest';
import type request from 'supertest';
import { Jimp } from 'jimp';
import type { ArtworkUpload } from '../../server/src/contracts/artwork.ts';
import { garmentListResponse } from '../../server/src/contracts/catalogue.ts';
import type { DesignDocument } from '../../server/src/contracts/designs.ts';
import { sharedDesignResponse } from '../../server/src/contracts/design-sharing.ts';
import { customerOrderResponse } from '../../server/src/contracts/orders.ts';
import { savedDesignListResponse } from '../../server/src/contracts/saved-designs.ts';
import { useApiHarness, type ApiAgent } from '../support/api-harness.ts';
import { signedInAgent } from '../support/api-calls.ts';
import { uploadPlainPicture } from '../support/upload-picture.ts';
import { orderDesignOf } from '../support/order-design.ts';

/**
 * WB-1009 (seeds/data/orders.ts) is Harriet's romper with her granddaughter's sun drawing (upload 1) on the chest.
 * The tests add a photo of hers (a plain red PNG) beside it: every picture of the design must show both.
 */
const ORDER = 'WB-1009';
/** The photo's red, #c2253f. */
const RED = { r: 0xc2, g: 0x25, b: 0x3f };
/** The proof's garment is 1000 px wide with 40 px round it (server/src/modules/orders/proof-render.ts). */
const PROOF_WIDTH_PX = 1000;
const PROOF_MARGIN_PX = 40;

const harness = useApiHarness();
let harriet: ApiAgent;
let staff: ApiAgent;
let photo: ArtworkUpload;
let designId: number;
let document: DesignDocument;

const binary = (res: request.Response, done: (error: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => done(null, Buffer.concat(chunks)));
};

beforeAll(async () => {
  harriet = await signedInAgent(harness, 'harriet@example.test');
  staff = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
  photo = await uploadPlainPicture(harriet, { width: 80, height: 40 }, 0xc2253fff);
  const stored = await orderDesignOf(harness.db, ORDER);
  designId = stored.id;
  const sun = stored.document.placements.find((placement) => placement.kind === 'artwork')!;
  if (sun.kind !== 'artwork') throw new Error('WB-1009 places the sun drawing');
  document = {
    version: 1,
    placements: [
      sun,
      { ...sun, id: 'photo', artworkUploadId: photo.id, centerYMm: sun.centerYMm + 70, widthMm: 60, rotationDeg: 0 },
    ],
  };
  await harness
    .db('designs')
    .where({ id: designId })
    .update({ document: JSON.stringify(document) });
});

describe('every picture of a design shows the customer’s uploads', () => {
  it('when the studio draws the proof, then the customer’s photo is in it where she placed it, as well as her drawing', async () => {
    const res = await staff.get(`/api/admin/orders/${ORDER}/proofs/preview`).buffer(true).parse(binary).expect(200);
    const proof = await Jimp.read(res.body as Buffer);
    const garments = garmentListResponse.parse((await harness.agent().get('/api/catalogue/garments').expect(200)).body);
    const design = await harness.db('designs').where({ id: designId }).first('garment_id', 'fabric_colour_id');
    const item = await harness
      .db('order_items as i')
      .join('orders as o', 'o.id', 'i.order_id')
      .where('o.number', ORDER)
      .first('i.garment_size_id');
    const garment = garments.garments.find((candidate) => candidate.id === design.garment_id)!;
    const size = garment.sizes.find((candidate) => candidate.id === item.garment_size_id)!;
    const pxPerMm = PROOF_WIDTH_PX / (garment.mockupWidthMm * size.mockupScale);
    const at = (xMm: number, yMm: number) => {
      const rgba = proof.getPixelColor(
        Math.round(PROOF_MARGIN_PX + xMm * pxPerMm),
        Math.round(PROOF_MARGIN_PX + yMm * pxPerMm),
      );
      return { r: (rgba >>> 24) & 255, g: (rgba >>> 16) & 255, b: (rgba >>> 8) & 255 };
    };
    const [sun, photoPlacement] = document.placements as Extract<DesignPlacementOf, { kind: 'artwork' }>[];
    // The photo's middle is its own red; a few levels off for the thread's soft shadow and rounding.
    const middle = at(photoPlacement!.centerXMm, photoPlacement!.centerYMm);
    expect(Math.abs(middle.r - RED.r)).toBeLessThan(12);
    expect(Math.abs(middle.g - RED.g)).toBeLessThan(12);
    expect(Math.abs(middle.b - RED.b)).toBeLessThan(12);
    // The sun drawing's middle is its Buttercup yellow, #f6d44a (seeds/uploads/sunshine-drawing.svg).
    const sunMiddle = at(sun!.centerXMm, sun!.centerYMm);
    expect(sunMiddle.r).toBeGreaterThan(220);
    expect(sunMiddle.g).toBeGreaterThan(190);
    expect(sunMiddle.b).toBeLessThan(110);
  });

  it('when the customer opens her order, then “Your design” comes with both uploads’ proportions and addresses, which open for her', async () => {
    const order = customerOrderResponse.parse((await harriet.get(`/api/orders/${ORDER}`).expect(200)).body);
    expect(order.design.uploads).toEqual([
      { uploadId: 1, widthPx: expect.any(Number), heightPx: expect.any(Number), imageUrl: '/api/artwork/1/image' },
      { uploadId: photo.id, widthPx: 80, heightPx: 40, imageUrl: `/api/artwork/${photo.id}/image` },
    ]);
    const image = await harriet.get(order.design.uploads[1]!.imageUrl).expect(200);
    expect(image.headers['content-type']).toBe('image/png');
  });

  it('when she lists her saved designs, then the design carries its uploads’ pictures; a design without any has none', async () => {
    const { designs } = savedDesignListResponse.parse((await harriet.get('/api/designs').expect(200)).body);
    const saved = designs.find((design) => design.id === designId)!;
    expect(saved.uploads.map((upload) => upload.uploadId)).toEqual([1, photo.id]);
    expect(designs.filter((design) => design.id !== designId).every((design) => design.uploads.length === 0)).toBe(
      true,
    );
  });

  it('when she shares the design, then anyone with the link sees both pictures through the link, and no other upload', async () => {
    const { shareToken } = (await harriet.post(`/api/designs/${designId}/share`).expect(200)).body as {
      shareToken: string;
    };
    const visitor = harness.agent();
    const shared = sharedDesignResponse.parse(
      (await visitor.get(`/api/shared-designs/${shareToken}`).expect(200)).body,
    );
    expect(shared.design.uploads.map((upload) => upload.imageUrl)).toEqual([
      `/api/shared-designs/${shareToken}/uploads/1/image`,
      `/api/shared-designs/${shareToken}/uploads/${photo.id}/image`,
    ]);
    const image = await visitor.get(shared.design.uploads[1]!.imageUrl).expect(200);
    expect(image.headers['content-type']).toBe('image/png');
    expect(image.headers['x-content-type-options']).toBe('nosniff');
    // Her own address stays hers; an upload the design does not place is not reachable through the link.
    await visitor.get(`/api/artwork/${photo.id}/image`).expect(404);
    const other = await uploadPlainPicture(harriet, { width: 4, height: 4 }, 0x000000ff);
    await visitor.get(`/api/shared-designs/${shareToken}/uploads/${other.id}/image`).expect(404);
    await visitor.get(`/api/shared-designs/${shareToken}/uploads/one/image`).expect(400);
  });
});

type DesignPlacementOf = DesignDocument['placements'][number];
