import type { Knex } from 'knex';
import { orderPlacementKey } from '../server/src/modules/orders/order-repo.ts';
import { rememberAddress } from '../server/src/modules/orders/customer-address-repo.ts';
import { userIds } from './data/accounts.ts';
import { replayOrder } from './data/order-history.ts';
import { orders, shipToByCustomer } from './data/orders.ts';
import { demoPeople } from './data/people.ts';
import { buildQuote, quoteSpecs } from './data/quotes.ts';

export async function seed(knex: Knex): Promise<void> {
  const ids = { event: 1, proof: 1, email: 1 };
  const rows: Record<'orders' | 'items' | 'events' | 'proofs' | 'payments' | 'emails', object[]> = {
    orders: [],
    items: [],
    events: [],
    proofs: [],
    payments: [],
    emails: [],
  };
  const customersWithOrders: (keyof typeof shipToByCustomer)[] = [];
  for (const order of orders) {
    const spec = quoteSpecs.find((candidate) => candidate.id === order.quoteId);
    if (!spec) throw new Error(`Seed data: order ${order.number} names a missing quote`);
    const quote = buildQuote(spec);
    if (!quote.customer || quote.designId === null)
      throw new Error(`Seed data: order ${order.number} needs a saved design`);
    const totals = quote.row as {
      subtotal_cents: number;
      shipping_cents: number;
      tax_cents: number;
      total_cents: number;
      currency: string;
      quantity: number;
    };
    const history = replayOrder({
      order,
      customer: quote.customer,
      customerEmail: demoPeople[userIds[quote.customer] - 1].email,
      totalCents: totals.total_cents,
      currency: totals.currency,
      ids,
    });
    const shipped = order.steps.find((step) => step.type === 'shipped');
    customersWithOrders.push(quote.customer);
    rows.orders.push({
      id: order.id,
      number: order.number,
      customer_id: userIds[quote.customer],
      quote_id: spec.id,
      placement_key: orderPlacementKey(spec.id, quote.designId),
      status: history.status,
      payment_status: history.paymentStatus,
      subtotal_cents: totals.subtotal_cents,
      shipping_cents: totals.shipping_cents,
      shipping_method: 'delivery',
      shipping_carrier: shipped ? 'Parcel post' : null,
      tracking_number: shipped?.trackingNumber ?? null,
      tax_cents: totals.tax_cents,
      total_cents: totals.total_cents,
      currency: totals.currency,
      needed_by: order.neededBy ?? null,
      ship_to: JSON.stringify(shipToByCustomer[quote.customer]),
      customer_note: order.customerNote ?? null,
      placed_at: history.placedAt,
      created_at: history.createdAt,
      updated_at: history.updatedAt,
    });
    // One line per order: the quote priced one design on identical garments. The unit price is the pre-tax
    // amount shared over the garments; the one-off artwork setup makes it inexact, so total_cents is the figure.
    rows.items.push({
      id: order.id,
      order_id: order.id,
      design_id: quote.designId,
      garment_size_id: quote.garmentSizeId,
      quantity: totals.quantity,
      unit_price_cents: Math.round(totals.subtotal_cents / totals.quantity),
      total_cents: totals.subtotal_cents,
      description: quote.description,
      created_at: history.createdAt,
      updated_at: history.createdAt,
    });
    rows.events.push(...history.events);
    rows.proofs.push(...history.proofs);
    rows.payments.push(history.payment);
    rows.emails.push(...history.emails);
  }
  await knex('orders').insert(rows.orders);
  await knex('order_items').insert(rows.items);
  await knex('order_events').insert(rows.events);
  await knex('proofs').insert(rows.proofs);
  await knex('payments').insert(rows.payments);
  await knex('email_log').insert(rows.emails);
  // Each customer's address, as their orders were sent there: offered again at their next checkout, last used
  // when their latest order was placed (so a second seeding writes the same rows).
  for (const customer of new Set(customersWithOrders)) {
    const placedTimes = (rows.orders as { customer_id: number; created_at: Date | string }[])
      .filter((row) => row.customer_id === userIds[customer])
      .map((row) => new Date(row.created_at).getTime());
    await rememberAddress(knex, userIds[customer], shipToByCustomer[customer], new Date(Math.max(...placedTimes)));
  }
  // The demo's orders carry their own numbers; the shop's next order continues after the highest.
  await knex.raw('ALTER SEQUENCE order_numbers RESTART WITH ?', [
    Math.max(...orders.map((order) => Number(order.number.slice(3)))) + 1,
  ]);
}
