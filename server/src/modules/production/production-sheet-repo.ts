import type { Db } from '../../db/knex.ts';
import { jsonColumn } from '../../db/json-column.ts';
import type { OrderStatus } from '../../contracts/order-status.ts';
import { mockupSizeMm } from '../../engine/garment-mockup-size.ts';

/** A mark on the centre-front line the studio measures from, mm down the front drawing at the order's size. */
export interface GarmentLandmark {
  label: string;
  yMm: number;
}

/** The order row and its (one) item with the ordered design, as a production sheet needs them. */
export interface OrderToMake {
  id: number;
  number: string;
  status: OrderStatus;
  /** Whose uploads the design's artwork placements are. */
  customerId: number;
  customerName: string;
  /** YYYY-MM-DD, or null. */
  neededBy: string | null;
  customerNote: string | null;
  /** What the customer said when approving the proof the studio stitches: a comment and pinned notes. */
  approvalNotes: { proofVersion: number; comment: string | null; pins: string[] } | null;
  quantity: number;
  designName: string;
  garmentId: number;
  sizeId: number;
  colourId: number;
  colourName: string;
  colourHex: string;
  /** The front drawing at the order's size, mm: its centre-front line is the middle of its width. */
  mockupWidthMm: number;
  landmarks: GarmentLandmark[];
  /** Left unread (`unknown`): the caller must pass it through restoreDesign. */
  document: unknown;
}

export interface ThreadRow {
  code: string;
  name: string;
  hex: string;
}

/** The order and its first item; undefined when there is no such order (or it has no item yet). */
export async function readOrderToMake(db: Db, number: string): Promise<OrderToMake | undefined> {
  const row = await db('orders as o')
    .join('users as u', 'u.id', 'o.customer_id')
    .join('order_items as i', 'i.order_id', 'o.id')
    .join('designs as d', 'd.id', 'i.design_id')
    .join('fabric_colours as c', 'c.id', 'd.fabric_colour_id')
    .join('garments as g', 'g.id', 'd.garment_id')
    .join('garment_sizes as s', 's.id', 'i.garment_size_id')
    .select(
      'o.id',
      'o.number',
      'o.status',
      'o.needed_by',
      'o.customer_note',
      'o.customer_id',
      'u.name as customer_name',
      'i.quantity',
      'i.garment_size_id',
      'd.name as design_name',
      'd.garment_id',
      'd.fabric_colour_id',
      'd.document',
      'c.name as colour_name',
      'c.hex as colour_hex',
      'g.slug as garment_slug',
      'g.mockup_svg',
      'g.landmarks',
      's.mockup_scale',
    )
    .where('o.number', number)
    .orderBy('i.id')
    .first();
  if (!row) return undefined;
  const approved = await db('proofs as p')
    .join('orders as o', 'o.id', 'p.order_id')
    .select('p.version', 'p.customer_comment', 'p.comment_pins', 'p.design_document')
    .where({ 'o.number': number, 'p.status': 'approved' })
    .orderBy('p.version', 'desc')
    .first();
  const pins: { comment: string }[] = approved
    ? typeof approved.comment_pins === 'string'
      ? JSON.parse(approved.comment_pins)
      : approved.comment_pins
    : [];
  const approvalNotes =
    approved && (approved.customer_comment || pins.length > 0)
      ? { proofVersion: approved.version, comment: approved.customer_comment, pins: pins.map((pin) => pin.comment) }
      : null;
  const scale = Number(row.mockup_scale);
  const landmarks: GarmentLandmark[] =
    (typeof row.landmarks === 'string' ? JSON.parse(row.landmarks) : row.landmarks) ?? [];
  return {
    id: row.id,
    number: row.number,
    status: row.status,
    customerId: row.customer_id,
    customerName: row.customer_name,
    neededBy: row.needed_by ? new Date(row.needed_by).toISOString().slice(0, 10) : null,
    customerNote: row.customer_note,
    approvalNotes,
    quantity: row.quantity,
    designName: row.design_name,
    garmentId: row.garment_id,
    sizeId: row.garment_size_id,
    colourId: row.fabric_colour_id,
    colourName: row.colour_name,
    colourHex: row.colour_hex,
    mockupWidthMm: mockupSizeMm(row.mockup_svg, row.garment_slug).widthMm * scale,
    landmarks: landmarks.map((landmark) => ({ label: landmark.label, yMm: landmark.yMm * scale })),
    // The design the customer approved: the studio may have changed it for a later proof (null on older proofs).
    document: jsonColumn(approved?.design_document ?? null) ?? row.document,
  };
}

/** Threads by code, retired ones included: an order is made in the threads it was designed with. */
export async function readThreadsByCode(db: Db, codes: string[]): Promise<Map<string, ThreadRow>> {
  const rows = await db('threads').select('code', 'name', 'hex').whereIn('code', codes);
  return new Map(rows.map((row) => [row.code as string, { code: row.code, name: row.name, hex: row.hex }]));
}

/** Motif artwork (the stored, sanitized SVG) by slug, retired motifs included. */
export async function readMotifArtwork(db: Db, slugs: string[]): Promise<Map<string, string>> {
  const rows = await db('motifs').select('slug', 'svg').whereIn('slug', slugs);
  return new Map(rows.map((row) => [row.slug as string, row.svg as string]));
}

/** The shop's active palette, for matching the customer's own colours to threads. */
export async function readPalette(db: Db): Promise<ThreadRow[]> {
  return db('threads').select('code', 'name', 'hex').where({ is_active: true }).orderBy(['sort_order', 'code']);
}
