import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { customerOrderListResponse, customerOrderResponse } from '../../server/src/contracts/orders.ts';
import { startPaymentHarness, type PaymentHarness } from '../support/payment-stand-ins.ts';
import { signedInAgent } from '../support/api-calls.ts';
import { sendTestProof } from '../support/proof-fixtures.ts';
import { fixedNow } from '../support/api-harness.ts';

let harness: PaymentHarness;
beforeAll(async () => {
  harness = await startPaymentHarness();
});
afterAll(async () => {
  await harness.close();
});

type Agent = ReturnType<PaymentHarness['agent']>;

const signedIn = (email: string): Promise<Agent> => signedInAgent(harness, email);

const detail = async (agent: Agent, number: string) =>
  customerOrderResponse.parse((await agent.get(`/api/orders/${number}`).expect(200)).body);

// Seeded: Priya's orders are WB-1002 (shipped, part refunded), WB-1007 (changes asked), WB-1010 (card held) and
// WB-1011 (cancelled); Harriet's WB-1008 waits on her answer to proof 2.
describe('GET /api/orders', () => {
  it('when a customer lists their orders, then they see only their own, newest first', async () => {
    const body = customerOrderListResponse.parse(
      (await (await signedIn('priya@example.test')).get('/api/orders').expect(200)).body,
    );
    expect(body.orders.map((order) => order.number)).toEqual(['WB-1010', 'WB-1011', 'WB-1007', 'WB-1002']);
    expect(body.orders.find((order) => order.number === 'WB-1010')).toMatchObject({
      status: 'authorized',
      isWaitingOnCustomer: false,
      garmentName: expect.any(String),
    });
  });

  it('when signed out, then it is 401', async () => {
    await harness.agent().get('/api/orders').expect(401);
    await harness.agent().get('/api/orders/WB-1010').expect(401);
  });
});

describe('GET /api/orders/:number', () => {
  it('when a customer opens their shipped order, then it has the quote snapshot, the design, the money and a timeline in their words', async () => {
    const order = await detail(await signedIn('priya@example.test'), 'WB-1002');
    expect(order.order).toMatchObject({ number: 'WB-1002', status: 'shipped', paymentStatus: 'partially_refunded' });
    expect(order.quote.lines.reduce((sum, line) => sum + line.amountCents, 0)).toBe(order.order.totalCents);
    expect(order.quote.ruleSetVersion).toBeGreaterThanOrEqual(1);
    expect(order.design).toMatchObject({
      id: 3,
      garmentSlug: expect.any(String),
      colourHex: expect.stringMatching(/^#[0-9a-f]{6}$/i),
    });
    expect(order.design.document.placements.length).toBeGreaterThan(0);
    expect(order.payment).toMatchObject({
      heldCents: 0,
      chargedCents: order.order.totalCents,
      refundedCents: 500,
      failureMessage: null,
    });
    const titles = order.timeline.map((entry) => entry.title);
    expect(titles[0]).toBe('You placed the order');
    expect(titles).toContain('Posted (Parcel post SEEDPOST0002)');
    // The studio's own note about the late parcel stays in the studio; the refund's reason is the customer's to read.
    expect(order.timeline.some((entry) => entry.type === 'note_added')).toBe(false);
    expect(order.timeline.find((entry) => entry.type === 'refunded')).toMatchObject({
      title: '$5.00 refunded',
      note: 'Goodwill refund for the late delivery.',
    });
    expect(order.actions).toEqual([]);
  });

  it('when the order is another customer’s or the number is malformed, then it is 404 or 400', async () => {
    const agent = await signedIn('priya@example.test');
    await agent.get('/api/orders/WB-1008').expect(404);
    await agent.get('/api/orders/WB-1008/proofs/2/image').expect(404);
    const bad = await agent.get('/api/orders/1008').expect(400);
    expect(bad.body.error.fields).toEqual({ number: 'must look like WB-1001' });
  });
});

describe('proof answers', () => {
  it('when Priya asks for a change with pins on proof 1 and approves proof 2, then the order moves, the proofs keep every answer, and the e-mails go out', async () => {
    const agent = await signedIn('priya@example.test');
    expect(await sendTestProof(harness.db, { orderNumber: 'WB-1010', now: fixedNow() })).toBe(1);
    const sent = await detail(agent, 'WB-1010');
    expect(sent.order.status).toBe('proof_sent');
    expect(sent.actions).toEqual(['request_changes', 'approve_proof', 'cancel']);
    expect(sent.proofs).toEqual([
      expect.objectContaining({
        version: 1,
        status: 'sent',
        source: 'render',
        isAnswerable: true,
        imageUrl: '/api/orders/WB-1010/proofs/1/image',
      }),
    ]);

    const image = await agent.get('/api/orders/WB-1010/proofs/1/image').expect(200);
    expect(image.headers['content-type']).toBe('image/png');
    expect(image.body.subarray(1, 4).toString()).toBe('PNG');
    await (await signedIn('tobias@wrenandbobbin.test')).get('/api/orders/WB-1010/proofs/1/image').expect(200);

    const pins = [{ xPct: 48.5, yPct: 81, comment: 'Could the daisies be a little smaller?' }];
    await agent
      .post('/api/orders/WB-1010/proofs/1/change-request')
      .send({ comment: 'Nearly there!', pins })
      .expect(200);
    const asked = await detail(agent, 'WB-1010');
    expect(asked.order.status).toBe('changes_requested');
    expect(asked.proofs[0]).toMatchObject({
      status: 'changes_requested',
      customerComment: 'Nearly there!',
      pins,
      isAnswerable: false,
      respondedAt: '2026-12-01T10:00:00.000Z',
    });
    await agent.post('/api/orders/WB-1010/proofs/1/approval').send({}).expect(409);

    expect(
      await sendTestProof(harness.db, {
        orderNumber: 'WB-1010',
        message: 'Smaller daisies, as you asked.',
        now: fixedNow(),
      }),
    ).toBe(2);
    await agent.post('/api/orders/WB-1010/proofs/1/approval').send({}).expect(409);
    await agent.post('/api/orders/WB-1010/proofs/3/approval').send({}).expect(404);
    await agent.post('/api/orders/WB-1010/proofs/2/approval').send({ comment: 'Perfect, thank you!' }).expect(200);
    const approved = await detail(agent, 'WB-1010');
    expect(approved.order.status).toBe('proof_approved');
    expect(approved.proofs.map((proof) => proof.status)).toEqual(['changes_requested', 'approved']);
    expect(approved.timeline.map((entry) => entry.title).slice(-3)).toEqual([
      'You asked for changes to proof 1',
      'Proof 2 is ready for you to look at',
      'You approved proof 2',
    ]);
    expect(approved.actions).toEqual(['cancel']);

    const logged = await harness
      .db('email_log')
      .where({ order_id: (await harness.db('orders').where({ number: 'WB-1010' }).first()).id })
      .whereIn('template', ['proof_approved', 'proof_approved_studio', 'changes_requested_studio'])
      .orderBy('id');
    expect(logged.map((mail) => [mail.template, mail.to_email, mail.status])).toEqual([
      ['changes_requested_studio', 'studio@wrenandbobbin.test', 'sent'],
      ['proof_approved', 'priya@example.test', 'sent'],
      ['proof_approved_studio', 'studio@wrenandbobbin.test', 'sent'],
    ]);
    expect(harness.mail.some((mail) => mail.subject === 'You approved the proof for WB-1010')).toBe(true);
  });

  it('when the pins are off the picture, too many, or the change request says nothing, then it is 400 with the fields', async () => {
    const agent = await signedIn('harriet@example.test');
    const off = await agent
      .post('/api/orders/WB-1008/proofs/2/change-request')
      .send({ pins: [{ xPct: 120, yPct: 10, comment: 'here' }] })
      .expect(400);
    expect(off.body.error.fields).toEqual({ 'pins.0.xPct': 'Place the pin on the picture' });
    const many = Array.from({ length: 21 }, () => ({ xPct: 10, yPct: 10, comment: 'here' }));
    const tooMany = await agent.post('/api/orders/WB-1008/proofs/2/change-request').send({ pins: many }).expect(400);
    expect(tooMany.body.error.fields.pins).toMatch(/at most 20 pins/);
    const empty = await agent.post('/api/orders/WB-1008/proofs/2/change-request').send({ comment: '  ' }).expect(400);
    expect(empty.body.error.fields).toEqual({ comment: 'Say what you would like changed' });
    const long = await agent
      .post('/api/orders/WB-1008/proofs/2/change-request')
      .send({ comment: 'x'.repeat(2001) })
      .expect(400);
    expect(long.body.error.fields.comment).toMatch(/2000 characters/);
  });

  it('when another customer answers the proof, then it is 404 and the proof waits as it was', async () => {
    await (await signedIn('priya@example.test')).post('/api/orders/WB-1008/proofs/2/approval').send({}).expect(404);
    expect((await harness.db('proofs').where({ order_id: 8, version: 2 }).first()).status).toBe('sent');
  });

  it('when Harriet approves with pins on the picture, then the studio gets every note: order page, e-mail to the studio app and the sheet', async () => {
    const pins = [
      { xPct: 40, yPct: 70, comment: 'Please use the pale pink thread for the name.' },
      { xPct: 60, yPct: 20, comment: 'Leave a little more room under the collar.' },
    ];
    await (
      await signedIn('harriet@example.test')
    )
      .post('/api/orders/WB-1008/proofs/2/approval')
      .send({ comment: 'Lovely!', pins })
      .expect(200);

    const staff = await signedIn('tobias@wrenandbobbin.test');
    const order = (await staff.get('/api/admin/orders/WB-1008').expect(200)).body;
    expect(order.proofs.at(-1)).toMatchObject({ status: 'approved', customerComment: 'Lovely!', commentPins: pins });

    const mail = await harness
      .db('email_log')
      .where({ order_id: 8, template: 'proof_approved_studio' })
      .orderBy('id', 'desc')
      .first();
    expect(mail.text_body).toContain('Pin 1: “Please use the pale pink thread for the name.”');
    expect(mail.text_body).toContain('Pin 2: “Leave a little more room under the collar.”');
    expect(mail.text_body).toMatch(/http:\/\/[^\s]+\/admin\/orders\/WB-1008(\s|$)/);
    expect(mail.text_body).not.toMatch(/[^n]\/orders\/WB-1008/);

    const sheet = (await staff.get('/api/admin/orders/WB-1008/production-sheet').expect(200)).body;
    expect(sheet.order.approvalNotes).toEqual({
      proofVersion: 2,
      comment: 'Lovely!',
      pins: pins.map((pin) => pin.comment),
    });
  });

  it('when a customer cancels an order already charged, then it is 409 and the order stays', async () => {
    const res = await (await signedIn('priya@example.test')).post('/api/orders/WB-1002/cancel').expect(409);
    expect(res.body.error.message).toMatch(/refund it instead/);
  });
});
