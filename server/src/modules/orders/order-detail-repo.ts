import type { Db } from '../../db/knex.ts';
import type { OrderDetailResponse } from '../../contracts/admin-orders.ts';
import { proofImagePath } from '../../contracts/studio-orders.ts';
import { orderArtworkImagePath } from '../../contracts/admin-orders.ts';
import { restoreDesign } from '../../contracts/designs.ts';
import { jsonColumn } from '../../db/json-column.ts';
import type { ShipTo } from '../../contracts/orders.ts';
import { deliveryOfRow } from './order-shipment-repo.ts';
import { proofVersionColumns, proofVersionOf } from './proof-repo.ts';

const iso = (value: Date | string | null): string | null => (value === null ? null : new Date(value).toISOString());

/** One order with everything the studio reads on its page: items, priced lines, payments, proofs and history. */
export async function readOrderDetail(
  db: Db,
  number: string,
): Promise<Omit<OrderDetailResponse, 'studioActions' | 'charge'> | undefined> {
  const order = await db('orders as o')
    .join('users as u', 'u.id', 'o.customer_id')
    .join('quotes as q', 'q.id', 'o.quote_id')
    .join('pricing_rule_sets as r', 'r.id', 'q.pricing_rule_set_id')
    .select(
      'o.*',
      'u.name as customer_name',
      'u.email as customer_email',
      'q.lines as quote_lines',
      'r.version as rule_set_version',
    )
    .where('o.number', number)
    .first();
  if (!order) return undefined;
  const [items, payments, proofs, events] = await Promise.all([
    db('order_items as i')
      .join('designs as d', 'd.id', 'i.design_id')
      .join('garment_sizes as s', 's.id', 'i.garment_size_id')
      .select(
        'i.id',
        'i.description',
        'i.quantity',
        'i.total_cents',
        'd.name as design_name',
        'd.document',
        's.placement_zones',
      )
      .where('i.order_id', order.id)
      .orderBy('i.id'),
    db('payments')
      .select(
        'status',
        'amount_authorized_cents',
        'amount_captured_cents',
        'amount_refunded_cents',
        'capture_before',
        'method',
        'provider_customer_id',
        'payment_method_id',
      )
      .where({ order_id: order.id })
      .orderBy('id'),
    db('proofs')
      .select(
        'version',
        'status',
        'message',
        'created_at',
        'responded_at',
        'source',
        'customer_comment',
        'comment_pins',
        ...proofVersionColumns,
        db.raw('image_png IS NOT NULL as has_image'),
      )
      .where({ order_id: order.id })
      .orderBy('version'),
    db('order_events as e')
      .leftJoin('users as a', 'a.id', 'e.actor_user_id')
      .select('e.id', 'e.type', 'e.from_status', 'e.to_status', 'e.note', 'a.name as actor_name', 'e.created_at')
      .where('e.order_id', order.id)
      .orderBy([{ column: 'e.created_at' }, { column: 'e.id' }]),
  ]);
  return {
    order: {
      id: order.id,
      number: order.number,
      status: order.status,
      paymentStatus: order.payment_status,
      customer: { name: order.customer_name, email: order.customer_email },
      neededBy: order.needed_by ? iso(order.needed_by)!.slice(0, 10) : null,
      placedAt: iso(order.placed_at),
      customerNote: order.customer_note,
      subtotalCents: Number(order.subtotal_cents),
      shippingCents: Number(order.shipping_cents),
      taxCents: Number(order.tax_cents),
      totalCents: Number(order.total_cents),
      currency: order.currency,
      delivery: deliveryOfRow(order),
      shipTo: jsonColumn(order.ship_to) as ShipTo,
    },
    items: items.map((i) => ({
      id: i.id,
      description: i.description,
      quantity: i.quantity,
      totalCents: Number(i.total_cents),
      designName: i.design_name,
      artwork: artworkOn(i.document).map((placement) => ({
        ...placement,
        zoneLabel: zoneLabelOf(i.placement_zones, placement.zone),
        imageUrl: orderArtworkImagePath(order.number, placement.uploadId),
      })),
    })),
    quote: { ruleSetVersion: order.rule_set_version, lines: order.quote_lines },
    payments: payments.map((p) => ({
      status: p.status,
      authorizedCents: Number(p.amount_authorized_cents),
      capturedCents: Number(p.amount_captured_cents),
      refundedCents: Number(p.amount_refunded_cents),
      captureBefore: iso(p.capture_before),
      method: p.method,
      isCardKept: p.provider_customer_id !== null && p.payment_method_id !== null,
    })),
    proofs: proofs.map((p) => ({
      version: p.version,
      status: p.status,
      message: p.message,
      sentAt: iso(p.created_at)!,
      respondedAt: iso(p.responded_at),
      source: p.source,
      customerComment: p.customer_comment,
      commentPins: typeof p.comment_pins === 'string' ? JSON.parse(p.comment_pins) : p.comment_pins,
      imageUrl: p.has_image ? proofImagePath(order.number, p.version) : null,
      ...proofVersionOf(p),
    })),
    events: events.map((e) => ({
      id: e.id,
      type: e.type,
      fromStatus: e.from_status,
      toStatus: e.to_status,
      note: e.note,
      actorName: e.actor_name,
      createdAt: iso(e.created_at)!,
    })),
  };
}

/** The name people read for a place on the garment ("Hem border"), never its code; the code if the size lost it. */
function zoneLabelOf(zones: unknown, code: string): string {
  const list = (typeof zones === 'string' ? JSON.parse(zones) : zones) as { code: string; label: string }[] | null;
  return list?.find((zone) => zone.code === code)?.label ?? code;
}

/** The uploaded pictures a stored design places; a document that no longer reads has none to show. */
export function artworkOn(document: unknown): { uploadId: number; zone: string; widthMm: number }[] {
  const restored = restoreDesign(document);
  if (!restored.success) return [];
  return restored.data.placements.flatMap((placement) =>
    placement.kind === 'artwork'
      ? [{ uploadId: placement.artworkUploadId, zone: placement.zone, widthMm: placement.widthMm }]
      : [],
  );
}

/** The order's customer and the uploads its designs place, so only those pictures can be opened from the order. */
export async function readOrderArtworkOwner(
  db: Db,
  number: string,
): Promise<{ customerId: number; uploadIds: number[] } | undefined> {
  const rows = await db('orders as o')
    .join('order_items as i', 'i.order_id', 'o.id')
    .join('designs as d', 'd.id', 'i.design_id')
    .select('o.customer_id', 'd.document')
    .where('o.number', number);
  if (rows.length === 0) return undefined;
  return {
    customerId: rows[0].customer_id,
    uploadIds: rows.flatMap((row) => artworkOn(row.document).map((placement) => placement.uploadId)),
  };
}
