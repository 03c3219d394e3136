import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { Jimp, JimpMime } from 'jimp';
import { orderDetailResponse } from '../../server/src/contracts/admin-orders.ts';
import { sentProofResponse } from '../../server/src/contracts/studio-orders.ts';
import { startApiHarness, type ApiHarness } from '../support/api-harness.ts';
import { pngDeclaring } from '../support/hostile-files.ts';

const UPLOAD_LIMIT_BYTES = 300_000;
let harness: ApiHarness;
let staff: ReturnType<ApiHarness['agent']>;

beforeAll(async () => {
  harness = await startApiHarness({ env: { UPLOAD_MAX_BYTES: String(UPLOAD_LIMIT_BYTES) } });
  staff = harness.agent();
  await harness.signIn(staff, 'marigold@wrenandbobbin.test');
});
afterAll(async () => {
  await harness.close();
});

/** Reads a pixel as #rrggbb. */
const hexAt = (image: Awaited<ReturnType<typeof Jimp.read>>, x: number, y: number) =>
  `#${(image.getPixelColor(Math.round(x), Math.round(y)) >>> 8).toString(16).padStart(6, '0')}`;

function isNear(a: string, b: string, tolerance = 3): boolean {
  const channels = (hex: string) => [1, 3, 5].map((i) => Number.parseInt(hex.slice(i, i + 2), 16));
  const [x, y] = [channels(a), channels(b)];
  return x.every((value, i) => Math.abs(value - y[i]!) <= tolerance);
}

async function stitchOutPhoto(): Promise<Buffer> {
  return new Jimp({ width: 64, height: 48, color: 0xd9c7b0ff }).getBuffer(JimpMime.jpeg);
}

describe('POST /api/admin/orders/:number/proofs', () => {
  it('when staff send a render, then version 1 is drawn on the garment, the order waits for the customer and the customer is e-mailed a link', async () => {
    // WB-1010: a pink dress with a daisy border and “Clara” in magenta; the card is held and no proof was sent yet.
    const res = await staff
      .post('/api/admin/orders/WB-1010/proofs')
      .send({ source: 'render', message: 'Here is Clara’s dress, drawn to scale.' })
      .expect(201);
    const sent = sentProofResponse.parse(res.body);
    expect(sent).toEqual({
      version: 1,
      source: 'render',
      status: 'proof_sent',
      imageUrl: '/api/admin/orders/WB-1010/proofs/1/image',
    });

    const image = await staff.get(sent.imageUrl).expect(200).expect('Content-Type', 'image/png');
    const picture = await Jimp.read(image.body as Buffer);
    expect(picture.width).toBe(1080);
    // The fabric colour fills the skirt between its pleats, and the name is sewn in its thread across the yoke.
    const order = await harness
      .db('orders as o')
      .join('order_items as i', 'i.order_id', 'o.id')
      .join('designs as d', 'd.id', 'i.design_id')
      .join('fabric_colours as c', 'c.id', 'd.fabric_colour_id')
      .where('o.number', 'WB-1010')
      .first('c.hex', 'o.id');
    expect(hexAt(picture, picture.width * 0.44, picture.height * 0.6)).toBe(order.hex.toLowerCase());
    const { hex: nameThread } = await harness.db('threads').where({ code: 'WB-110' }).first('hex');
    const yoke = Array.from({ length: 40 * 120 }, (_, i) =>
      hexAt(picture, picture.width * 0.45 + (i % 120), picture.height * 0.17 + Math.floor(i / 120)),
    );
    // Compositing the thread's shadow rounds a channel by a step or two.
    expect(yoke.some((hex) => isNear(hex, nameThread))).toBe(true);

    const mail = await harness
      .db('email_log')
      .where({ order_id: order.id, template: 'proof_ready' })
      .orderBy('id', 'desc')
      .first();
    expect(mail.subject).toBe('Your proof for WB-1010 is ready');
    expect(mail.text_body).toContain(`${harness.config.appOrigin}/orders/WB-1010`);
    expect(mail.text_body).toContain('Here is Clara’s dress');
  });

  it('when staff send a photo of a stitch-out before the customer answers, then it becomes version 2 and version 1 is superseded', async () => {
    const res = await staff
      .post('/api/admin/orders/WB-1010/proofs')
      .field('source', 'photo')
      .field('message', 'A test stitch-out on the same fabric.')
      .attach('file', await stitchOutPhoto(), { filename: 'stitch-out.jpg', contentType: 'image/jpeg' })
      .expect(201);
    expect(sentProofResponse.parse(res.body)).toMatchObject({ version: 2, source: 'photo' });
    const stored = await staff
      .get('/api/admin/orders/WB-1010/proofs/2/image')
      .expect(200)
      .expect('Content-Type', 'image/png');
    expect((await Jimp.read(stored.body as Buffer)).width).toBe(64);

    const detail = orderDetailResponse.parse((await staff.get('/api/admin/orders/WB-1010').expect(200)).body);
    expect(detail.proofs.map((proof) => [proof.version, proof.status, proof.source])).toEqual([
      [1, 'superseded', 'render'],
      [2, 'sent', 'photo'],
    ]);
    expect(detail.order.status).toBe('proof_sent');
    expect(detail.studioActions).toEqual(['send_proof', 'cancel']);
  });

  it('when the photo is not a PNG or JPEG, then it answers 415 and keeps nothing', async () => {
    const gif = Buffer.from('R0lGODlhAQABAIAAAAAAAP///yH5BAEAAAAALAAAAAABAAEAAAIBRAA7', 'base64');
    const res = await staff
      .post('/api/admin/orders/WB-1009/proofs')
      .field('source', 'photo')
      .field('message', 'Photo')
      .attach('file', gif, { filename: 'stitch-out.png', contentType: 'image/png' })
      .expect(415);
    expect(res.body.error.message).toMatch(/GIF.*PNG or JPEG/);
    const svg = Buffer.from(
      '<svg xmlns="http://www.w3.org/2000/svg" width="4" height="4"><rect width="4" height="4"/></svg>',
    );
    await staff
      .post('/api/admin/orders/WB-1009/proofs')
      .field('source', 'photo')
      .field('message', 'Photo')
      .attach('file', svg, { filename: 'stitch-out.jpg', contentType: 'image/jpeg' })
      .expect(415);
    const order = await harness.db('orders').where({ number: 'WB-1009' }).first('id', 'status');
    expect(order.status).toBe('authorized');
    expect(await harness.db('proofs').where({ order_id: order.id })).toHaveLength(0);
  });

  it('when the photo is larger than the upload limit, then it answers 413', async () => {
    const huge = Buffer.concat([await stitchOutPhoto(), Buffer.alloc(UPLOAD_LIMIT_BYTES)]);
    const res = await staff
      .post('/api/admin/orders/WB-1009/proofs')
      .field('source', 'photo')
      .field('message', 'Photo')
      .attach('file', huge, { filename: 'big.jpg', contentType: 'image/jpeg' })
      .expect(413);
    expect(res.body.error.kind).toBe('too-large');
  });

  it('when the photo is a 45-byte PNG declaring 20,000 × 20,000 px, then it answers 413 from its header and keeps nothing', async () => {
    const res = await staff
      .post('/api/admin/orders/WB-1009/proofs')
      .field('source', 'photo')
      .field('message', 'Photo')
      .attach('file', pngDeclaring(20_000, 20_000), { filename: 'stitch-out.png', contentType: 'image/png' })
      .expect(413);
    expect(res.body.error.message).toMatch(/^That picture is 20,000 × 20,000 px .*under 25 megapixels\.$/);
    const order = await harness.db('orders').where({ number: 'WB-1009' }).first('id');
    expect(await harness.db('proofs').where({ order_id: order.id })).toHaveLength(0);
  });

  it('when a photo proof comes without its file, or without a message, then it answers 400 naming the field', async () => {
    const noFile = await staff
      .post('/api/admin/orders/WB-1009/proofs')
      .field('source', 'photo')
      .field('message', 'Photo')
      .expect(400);
    expect(noFile.body.error.fields).toHaveProperty('file');
    const noMessage = await staff
      .post('/api/admin/orders/WB-1009/proofs')
      .send({ source: 'render', message: '  ' })
      .expect(400);
    expect(noMessage.body.error.fields).toHaveProperty('message');
    const badSource = await staff
      .post('/api/admin/orders/WB-1009/proofs')
      .send({ source: 'sketch', message: 'Hi' })
      .expect(400);
    expect(badSource.body.error.fields).toHaveProperty('source');
  });

  it('when the proof is already approved, then sending another is refused with the state machine’s reason', async () => {
    const res = await staff
      .post('/api/admin/orders/WB-1006/proofs')
      .send({ source: 'render', message: 'One more?' })
      .expect(409);
    expect(res.body.error.message).toBe('The proof has already been approved; it cannot be replaced now.');
  });

  it('when the customer has not paid yet, then no proof can be sent', async () => {
    const res = await staff
      .post('/api/admin/orders/WB-1012/proofs')
      .send({ source: 'render', message: 'Early' })
      .expect(409);
    expect(res.body.error.message).toMatch(/not paid yet/);
  });
});

describe('GET /api/admin/orders/:number/proofs/preview', () => {
  it('when staff preview the drawing, then they get the picture a render would send, and nothing is kept or sent', async () => {
    const order = await harness.db('orders').where({ number: 'WB-1003' }).first('id', 'status');
    const mailsBefore = await harness.db('email_log').where({ order_id: order.id }).count({ n: '*' });
    const res = await staff
      .get('/api/admin/orders/WB-1003/proofs/preview')
      .expect(200)
      .expect('Content-Type', 'image/png');
    expect((await Jimp.read(res.body as Buffer)).width).toBe(1080);
    expect(await harness.db('orders').where({ id: order.id }).first('status')).toEqual({ status: order.status });
    expect(await harness.db('email_log').where({ order_id: order.id }).count({ n: '*' })).toEqual(mailsBefore);
    await staff.get('/api/admin/orders/WB-9999/proofs/preview').expect(404);
  });
});

describe('GET /api/admin/orders/:number/proofs/:version/image', () => {
  it('when the version does not exist or kept no picture, then it answers 404', async () => {
    await staff.get('/api/admin/orders/WB-1010/proofs/9/image').expect(404);
    // Seeded history has proofs without pictures.
    const res = await staff.get('/api/admin/orders/WB-1007/proofs/1/image').expect(404);
    expect(res.body.error.message).toMatch(/No picture/);
  });

  it('when a customer or a visitor asks for a proof picture here, then it is refused', async () => {
    const customer = harness.agent();
    await harness.signIn(customer, 'priya@example.test');
    await customer.get('/api/admin/orders/WB-1010/proofs/1/image').expect(403);
    await request(harness.app).get('/api/admin/orders/WB-1010/proofs/1/image').expect(401);
  });
});
