import type { Db } from '../../db/knex.ts';
import type { DesignDocument } from '../../contracts/designs.ts';
import type { QuotePreviewResponse } from '../../contracts/quotes.ts';
import type { QuotePlacement } from '../../engine/index.ts';
import type { ShippingMethod } from '../../contracts/shipping.ts';

/** What a quote priced, kept in quotes.input so the quote can be shown, checked against an order and repriced. */
export interface StoredQuoteInput {
  garmentId: number;
  sizeId: number;
  colourId: number | null;
  garment: string;
  sizeCode: string;
  fabricColour: string | null;
  document: DesignDocument;
  quantity: number;
  isRush: boolean;
  placements: QuotePlacement[];
  /** The method the shipping line prices and the methods offered with it; missing on quotes from before shipping. */
  shipping?: QuotePreviewResponse['quote']['shipping'];
  /** The preview's figures beyond the price (placements, run time, stabilizer, cautions), to show the quote again. */
  figures: Omit<QuotePreviewResponse, 'quote'>;
}

export interface StoredQuote {
  id: number;
  designId: number | null;
  customerId: number | null;
  ruleSetId: number;
  ruleSetVersion: number;
  quantity: number;
  isRush: boolean;
  /** Seeded quotes predate `figures` and the ids, so the input is only partly there. */
  input: Partial<StoredQuoteInput>;
  lines: QuotePreviewResponse['quote']['lines'];
  subtotalCents: number;
  shippingCents: number;
  /** Null on quotes priced before shipping was quoted. */
  shippingMethod: ShippingMethod | null;
  taxCents: number;
  totalCents: number;
  currency: string;
  expiresAt: Date;
  /** The quote's shipping as the apps show it, when it has any. */
  shipping?: QuotePreviewResponse['quote']['shipping'];
}

export interface QuoteWrite {
  designId: number | null;
  customerId: number | null;
  ruleSetId: number;
  input: StoredQuoteInput;
  quote: QuotePreviewResponse['quote'];
  stitchCount: number;
  hoopingCount: number;
  colourChangeCount: number;
  runMinutes: number;
  expiresAt: Date;
  createdAt: Date;
}

export async function insertQuote(db: Db, write: QuoteWrite): Promise<number> {
  const [id] = await db('quotes').insert({
    design_id: write.designId,
    customer_id: write.customerId,
    pricing_rule_set_id: write.ruleSetId,
    quantity: write.input.quantity,
    is_rush: write.input.isRush,
    input: JSON.stringify(write.input),
    lines: JSON.stringify(write.quote.lines),
    subtotal_cents: write.quote.subtotalCents,
    shipping_cents: write.quote.shippingCents,
    shipping_method: write.quote.shipping?.method ?? null,
    tax_cents: write.quote.taxCents,
    total_cents: write.quote.totalCents,
    currency: write.quote.currency,
    stitch_count: write.stitchCount,
    hooping_count: write.hoopingCount,
    colour_change_count: write.colourChangeCount,
    run_minutes: write.runMinutes.toFixed(2),
    expires_at: write.expiresAt,
    created_at: write.createdAt,
    updated_at: write.createdAt,
  });
  return id as number;
}

export async function findQuote(db: Db, id: number): Promise<StoredQuote | undefined> {
  const row = await db('quotes as q')
    .join('pricing_rule_sets as r', 'r.id', 'q.pricing_rule_set_id')
    .select('q.*', 'r.version as rule_set_version')
    .where('q.id', id)
    .first();
  if (!row) return undefined;
  return {
    id: row.id,
    designId: row.design_id,
    customerId: row.customer_id,
    ruleSetId: row.pricing_rule_set_id,
    ruleSetVersion: row.rule_set_version,
    quantity: row.quantity,
    isRush: Boolean(row.is_rush),
    input: row.input,
    lines: row.lines,
    subtotalCents: Number(row.subtotal_cents),
    shippingCents: Number(row.shipping_cents),
    shippingMethod: row.shipping_method,
    ...(row.input?.shipping ? { shipping: row.input.shipping } : {}),
    taxCents: Number(row.tax_cents),
    totalCents: Number(row.total_cents),
    currency: row.currency,
    expiresAt: new Date(row.expires_at),
  };
}

export async function findFabricColourName(db: Db, colourId: number): Promise<string | null> {
  const row = await db('fabric_colours').select('name').where({ id: colourId }).first();
  return row?.name ?? null;
}
