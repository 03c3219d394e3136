import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { shippingSettingsResponse, type ShippingSettings } from '../../server/src/contracts/shipping.ts';
import { quotePreviewResponse } from '../../server/src/contracts/quotes.ts';
import { customerOrderResponse } from '../../server/src/contracts/orders.ts';
import { orderDetailResponse } from '../../server/src/contracts/admin-orders.ts';
import { savedAddressesResponse } from '../../server/src/contracts/saved-addresses.ts';
import { colourChangesBetween } from '../../server/src/engine/index.ts';
import { shopSettings } from '../../seeds/data/shop.ts';
import { startPaymentHarness, type PaymentHarness } from '../support/payment-stand-ins.ts';
import { errorOf, signedInAgent } from '../support/api-calls.ts';
import { priyaShipTo, quoteSavedDesign, savedDesignQuoteBody } from '../support/priya-orders.ts';

let harness: PaymentHarness;
beforeAll(async () => {
  harness = await startPaymentHarness();
});
afterAll(async () => {
  await harness.close();
});

type Agent = ReturnType<PaymentHarness['agent']>;
const priya = 'priya@example.test';
const harriet = 'harriet@example.test';
const owner = 'marigold@wrenandbobbin.test';
const staff = 'tobias@wrenandbobbin.test';

const seededShipping: ShippingSettings = {
  delivery: { isOffered: true, flatCents: 695, freeFromCents: 7500 },
  pickup: { isOffered: true, note: shopSettings.pickup_note },
};

/** Priya's seeded design 1 (a daisy border and a name on a bishop dress), as a quote request. */
const designBody = (agent: Agent, shippingMethod?: 'delivery' | 'pickup') =>
  savedDesignQuoteBody(agent, 1, shippingMethod ? { shippingMethod } : {});

const storedQuote = (agent: Agent, shippingMethod?: 'delivery' | 'pickup') =>
  quoteSavedDesign(agent, 1, shippingMethod ? { shippingMethod } : {});

const orderBody = (quoteId: number, shippingMethod?: 'delivery' | 'pickup') => ({
  quoteId,
  designId: 1,
  neededBy: '2026-12-18',
  shipTo: priyaShipTo,
  ...(shippingMethod ? { shippingMethod } : {}),
});

describe('shipping in the quote', () => {
  it('when a design is priced, then delivery is a line of its own, untaxed, with every method the shop offers', async () => {
    const agent = await signedInAgent(harness, priya);
    const quote = await storedQuote(agent);
    const { lines, subtotalCents, shippingCents, taxCents, totalCents, shipping } = quote.quote;
    const line = lines.find((candidate) => candidate.code === 'shipping');
    // The seeded rates: 6.95 a parcel, free from 75.00 of goods; this dress comes to more than that.
    const isFree = subtotalCents >= 7500;
    expect(line).toMatchObject({ amountCents: isFree ? 0 : 695 });
    expect(shippingCents).toBe(isFree ? 0 : 695);
    expect(subtotalCents + shippingCents + taxCents).toBe(totalCents);
    expect(lines.reduce((sum, each) => sum + each.amountCents, 0)).toBe(totalCents);
    expect(shipping).toEqual({
      method: 'delivery',
      options: [
        { method: 'delivery', name: 'Delivery to your address', cents: isFree ? 0 : 695 },
        { method: 'pickup', name: 'Pick up at the studio', cents: 0 },
      ],
      freeDeliveryFromCents: 7500,
      pickupNote: shopSettings.pickup_note,
    });
    const row = await harness.db('quotes').where({ id: quote.quoteId }).first();
    expect(row).toMatchObject({ shipping_cents: shippingCents, shipping_method: 'delivery' });

    const pickup = await storedQuote(agent, 'pickup');
    expect(pickup.quote.shippingCents).toBe(0);
    expect(pickup.quote.lines.find((each) => each.code === 'shipping')?.label).toBe('Pick up at the studio');
  });

  it('when a design has several placements, then the re-hooping and thread-change lines agree with the stitching plan', async () => {
    const agent = await signedInAgent(harness, priya);
    const { designId: _saved, ...body } = await designBody(agent);
    const preview = quotePreviewResponse.parse((await agent.post('/api/quotes/preview').send(body).expect(200)).body);
    const hoopingsListed = preview.placements.reduce((sum, placement) => sum + placement.hoopings, 0);
    const placements = preview.placements.length;
    expect(placements).toBeGreaterThan(1);
    expect(preview.stitching).toMatchObject({ hoopings: hoopingsListed, extraHoopings: hoopingsListed - placements });
    const rehooping = preview.quote.lines.find((line) => line.code === 'extra-hoopings');
    expect(rehooping?.label).toContain(
      `${hoopingsListed - placements} extra hooping${hoopingsListed - placements === 1 ? '' : 's'} of ${hoopingsListed} hoopings in all`,
    );
    expect(rehooping?.rate).toEqual({ cents: expect.any(Number), per: 'extra hooping' });

    // Thread changes: each placement's own, and one into a placement that starts on another thread.
    const threads = body.document.placements.map((placement) =>
      'threads' in placement ? placement.threads : 'thread' in placement ? [placement.thread] : undefined,
    );
    const between = colourChangesBetween(threads).reduce((sum, changes) => sum + changes, 0);
    const within = preview.placements.reduce((sum, placement) => sum + placement.colourChanges, 0);
    expect(preview.stitching).toMatchObject({
      colourChanges: within + between,
      colourChangesBetweenPlacements: between,
    });
    const changes = within + between;
    const changesLine = preview.quote.lines.find((line) => line.code === 'color-changes');
    if (changes > 0) expect(changesLine?.label).toContain(`${changes} colour change`);
    expect(preview.quote.lines.find((line) => line.code === 'stitching')?.rate?.per).toBe('1,000 stitches');
  });
});

describe('shipping settings and checkout', () => {
  it('when staff read the shipping settings, then they see the seeded rates and may not change them', async () => {
    const agent = await signedInAgent(harness, staff);
    expect(shippingSettingsResponse.parse((await agent.get('/api/admin/settings/shipping').expect(200)).body)).toEqual({
      settings: seededShipping,
      canEdit: false,
    });
    const refused = await agent.put('/api/admin/settings/shipping').send(seededShipping).expect(403);
    expect(errorOf(refused.body).message).toBe('Only the studio owner can change delivery and pick-up.');
    const customer = await signedInAgent(harness, priya);
    await customer.get('/api/admin/settings/shipping').expect(403);
  });

  it('when the owner offers neither way or a negative charge, then it is a 400 at the field', async () => {
    const agent = await signedInAgent(harness, owner);
    const neither = await agent
      .put('/api/admin/settings/shipping')
      .send({ delivery: { ...seededShipping.delivery, isOffered: false }, pickup: { isOffered: false, note: '' } })
      .expect(400);
    expect(errorOf(neither.body).fields?.['delivery.isOffered']).toBe(
      'Offer delivery, pick-up or both, or nobody can order',
    );
    const negative = await agent
      .put('/api/admin/settings/shipping')
      .send({ ...seededShipping, delivery: { ...seededShipping.delivery, flatCents: -1 } })
      .expect(400);
    expect(errorOf(negative.body).fields?.['delivery.flatCents']).toBe("The delivery charge can't be negative");
  });

  it('when the shop stops offering pick-up after the quote, then checkout refuses it with 422 and a sentence', async () => {
    const customer = await signedInAgent(harness, priya);
    const quote = await storedQuote(customer, 'pickup');
    const studio = await signedInAgent(harness, owner);
    const pickupOff = { ...seededShipping, pickup: { ...seededShipping.pickup, isOffered: false } };
    await studio.put('/api/admin/settings/shipping').send(pickupOff).expect(200);
    try {
      const refused = await customer.post('/api/orders').send(orderBody(quote.quoteId, 'pickup')).expect(422);
      const sentence = 'The studio no longer offers pick-up at the studio; choose delivery to your address instead.';
      expect(errorOf(refused.body)).toMatchObject({ message: sentence, fields: { shippingMethod: sentence } });
      const preview = await customer
        .post('/api/quotes/preview')
        .send({ ...(await designBody(customer)), designId: undefined, shippingMethod: 'pickup' })
        .expect(422);
      expect(errorOf(preview.body).message).toBe(sentence);
      expect(await harness.db('orders').where({ quote_id: quote.quoteId }).first()).toBeUndefined();
    } finally {
      await studio.put('/api/admin/settings/shipping').send(seededShipping).expect(200);
    }
  });

  it('when the owner lowers the flat rate and raises the free amount, then a new quote charges the new rate', async () => {
    const studio = await signedInAgent(harness, owner);
    const dearer = { ...seededShipping, delivery: { isOffered: true, flatCents: 450, freeFromCents: 1_000_000 } };
    const saved = await studio.put('/api/admin/settings/shipping').send(dearer).expect(200);
    expect(shippingSettingsResponse.parse(saved.body)).toEqual({ settings: dearer, canEdit: true });
    try {
      const customer = await signedInAgent(harness, priya);
      const quote = await storedQuote(customer);
      expect(quote.quote.shippingCents).toBe(450);
    } finally {
      await studio.put('/api/admin/settings/shipping').send(seededShipping).expect(200);
    }
  });

  it('when the checkout method differs from the quote’s, then it is a 409 asking to price again', async () => {
    const customer = await signedInAgent(harness, priya);
    const quote = await storedQuote(customer, 'delivery');
    const refused = await customer.post('/api/orders').send(orderBody(quote.quoteId, 'pickup')).expect(409);
    expect(errorOf(refused.body).message).toBe(
      'This price was worked out for delivery to your address. Price it again with pick-up at the studio.',
    );
  });

  it('when Priya orders with delivery, then the order keeps the quote’s shipping and both order pages show it', async () => {
    const studio = await signedInAgent(harness, owner);
    // A flat rate on every order, so the shipping line has an amount to carry.
    const flat = { ...seededShipping, delivery: { isOffered: true, flatCents: 695, freeFromCents: null } };
    await studio.put('/api/admin/settings/shipping').send(flat).expect(200);
    try {
      const customer = await signedInAgent(harness, priya);
      const quote = await storedQuote(customer, 'delivery');
      expect(quote.quote.shippingCents).toBe(695);
      const placed = await customer.post('/api/orders').send(orderBody(quote.quoteId, 'delivery')).expect(201);
      const row = await harness.db('orders').where({ number: placed.body.number }).first();
      expect(row).toMatchObject({
        shipping_cents: 695,
        shipping_method: 'delivery',
        subtotal_cents: quote.quote.subtotalCents,
        total_cents: quote.quote.totalCents,
      });
      expect(row.subtotal_cents + row.shipping_cents + row.tax_cents).toBe(row.total_cents);

      const page = customerOrderResponse.parse(
        (await customer.get(`/api/orders/${placed.body.number}`).expect(200)).body,
      );
      expect(page.order).toMatchObject({
        shippingCents: 695,
        delivery: { method: 'delivery', carrier: null, trackingNumber: null },
      });
      expect(page.quote.lines.find((line) => line.code === 'shipping')?.amountCents).toBe(695);
      const detail = orderDetailResponse.parse(
        (await studio.get(`/api/admin/orders/${placed.body.number}`).expect(200)).body,
      );
      expect(detail.order).toMatchObject({ shippingCents: 695, delivery: { method: 'delivery' } });
      expect(detail.order.shipTo.line1).toBe(priyaShipTo.line1);
    } finally {
      await studio.put('/api/admin/settings/shipping').send(seededShipping).expect(200);
    }
  });

  it('when the database is asked for an order whose parts do not sum, then the table check refuses it', async () => {
    const row = await harness.db('orders').where({ number: 'WB-1001' }).first();
    await expect(
      harness
        .db('orders')
        .where({ id: row.id })
        .update({ shipping_cents: row.shipping_cents + 1 }),
    ).rejects.toThrow(/orders_total_sums/);
  });
});

describe('saved addresses', () => {
  it('when Priya has ordered, then her address is offered at her next checkout, and only to her', async () => {
    const customer = await signedInAgent(harness, priya);
    const mine = savedAddressesResponse.parse((await customer.get('/api/addresses').expect(200)).body);
    expect(mine.addresses.map((saved) => saved.address.line1)).toContain(priyaShipTo.line1);
    // The same address ordered to again is kept once.
    expect(mine.addresses.filter((saved) => saved.address.line1 === priyaShipTo.line1)).toHaveLength(1);

    const other = await signedInAgent(harness, harriet);
    const hers = savedAddressesResponse.parse((await other.get('/api/addresses').expect(200)).body);
    expect(hers.addresses.map((saved) => saved.address.line1)).not.toContain(priyaShipTo.line1);
    const priyas = mine.addresses[0].id;
    await other.delete(`/api/addresses/${priyas}`).expect(404);
    await harness.agent().get('/api/addresses').expect(401);

    await customer.delete(`/api/addresses/${priyas}`).expect(200);
    const after = savedAddressesResponse.parse((await customer.get('/api/addresses').expect(200)).body);
    expect(after.addresses.map((saved) => saved.id)).not.toContain(priyas);
  });
});

describe('tracking', () => {
  it('when the studio ships with a carrier and tracking number, then both order pages and the e-mail show them', async () => {
    const studio = await signedInAgent(harness, staff);
    const order = await harness
      .db('orders as o')
      .join('users as u', 'u.id', 'o.customer_id')
      .where('o.number', 'WB-1003')
      .first('o.id', 'u.email');
    await studio
      .post('/api/admin/orders/WB-1003/shipped')
      .send({ carrier: 'Parcel post', trackingNumber: 'PP 1234 5678' })
      .expect(200);

    const detail = orderDetailResponse.parse((await studio.get('/api/admin/orders/WB-1003').expect(200)).body);
    expect(detail.order.delivery).toMatchObject({ carrier: 'Parcel post', trackingNumber: 'PP 1234 5678' });
    const customer = await signedInAgent(harness, order.email);
    const page = customerOrderResponse.parse((await customer.get('/api/orders/WB-1003').expect(200)).body);
    expect(page.order.delivery).toMatchObject({ carrier: 'Parcel post', trackingNumber: 'PP 1234 5678' });
    const mail = await harness.db('email_log').where({ order_id: order.id, template: 'order_shipped' }).first();
    expect(mail.text_body).toContain('Carrier: Parcel post. Tracking number: PP 1234 5678');

    const tooLong = await studio
      .post('/api/admin/orders/WB-1001/shipped')
      .send({ carrier: 'x'.repeat(61) })
      .expect(400);
    expect(errorOf(tooLong.body).fields?.carrier).toBe('keep the carrier’s name under 60 characters');
  });
});
