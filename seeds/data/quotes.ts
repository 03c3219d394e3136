import { estimateRunMinutes, priceQuote } from '../../server/src/engine/index.ts';
import { shippingRatesOfRow } from '../../server/src/db/shipping-rates-columns.ts';
import { designFigures, type DesignChoice } from './design-figures.ts';
import { designs } from './designs.ts';
import { publishedRuleSet } from './pricing.ts';
import { addDays, at } from './seed-time.ts';
import { shopSettings } from './shop.ts';
import { userIds, type CustomerKey } from './accounts.ts';

interface QuoteSpec {
  id: number;
  /** A saved design, or an unsaved one a visitor priced before signing in. */
  design: number | { visitor: DesignChoice };
  quantity: number;
  isRush: boolean;
  createdAt: string;
}

/** Quotes the scenario's orders were placed from (ids 1–12, one per order), one saved and one visitor quote, then 15 for WB-1013. */
export const quoteSpecs: QuoteSpec[] = [
  { id: 1, design: 7, quantity: 1, isRush: false, createdAt: '2026-11-08T18:12' },
  { id: 2, design: 3, quantity: 1, isRush: false, createdAt: '2026-11-09T14:05' },
  { id: 3, design: 9, quantity: 1, isRush: false, createdAt: '2026-11-13T03:10' },
  { id: 4, design: 5, quantity: 2, isRush: false, createdAt: '2026-11-16T13:35' },
  { id: 5, design: 12, quantity: 1, isRush: false, createdAt: '2026-11-14T02:25' },
  { id: 6, design: 11, quantity: 1, isRush: false, createdAt: '2026-11-22T02:55' },
  { id: 7, design: 2, quantity: 1, isRush: false, createdAt: '2026-11-23T16:25' },
  { id: 8, design: 6, quantity: 1, isRush: false, createdAt: '2026-11-22T14:05' },
  { id: 9, design: 8, quantity: 1, isRush: false, createdAt: '2026-11-26T15:15' },
  { id: 10, design: 1, quantity: 1, isRush: true, createdAt: '2026-11-27T01:50' },
  { id: 11, design: 4, quantity: 1, isRush: false, createdAt: '2026-11-24T00:20' },
  { id: 12, design: 10, quantity: 1, isRush: false, createdAt: '2026-11-27T22:40' },
  { id: 13, design: 13, quantity: 1, isRush: false, createdAt: '2026-11-27T03:25' },
  {
    id: 14,
    design: {
      visitor: {
        garment: 'smocked-yoke-dress',
        size: '4T',
        colour: 'Meadow Green',
        placements: [{ id: 'hem', kind: 'border', motif: 'strawberry-vine', run: 'circumference' }],
      },
    },
    quantity: 3,
    isRush: false,
    createdAt: '2026-11-28T00:30',
  },
  { id: 15, design: 14, quantity: 1, isRush: false, createdAt: '2026-11-17T19:45' },
];

/** A quote is good for two weeks: long enough to decide, short enough that prices do not go stale. */
const validityDays = 14;

const machine = {
  stitchesPerMinute: shopSettings.machine_stitches_per_minute,
  minutesPerColorChange: shopSettings.minutes_per_colour_change,
  minutesPerHooping: shopSettings.minutes_per_hooping,
  setupMinutes: shopSettings.setup_minutes,
};

export interface BuiltQuote {
  row: Record<string, unknown>;
  designId: number | null;
  customer: CustomerKey | null;
  garmentSizeId: number;
  description: string;
}

/** Prices a quote with the engine, exactly as the server would: the row for `quotes` and what an order needs. */
export function buildQuote(spec: QuoteSpec): BuiltQuote {
  const saved = typeof spec.design === 'number' ? designs.find((design) => design.id === spec.design) : undefined;
  const choice = saved ?? (typeof spec.design === 'number' ? undefined : spec.design.visitor);
  if (!choice) throw new Error(`Seed data: quote ${spec.id} names a missing design`);
  const figures = designFigures(choice);
  const quote = priceQuote({
    ruleSet: publishedRuleSet.rules,
    garment: { slug: figures.garment.slug, name: figures.garment.name },
    sizeCode: figures.size.code,
    sizeLabel: figures.size.label,
    quantity: spec.quantity,
    placements: figures.quotePlacements,
    isRush: spec.isRush,
    shipping: { rates: shippingRatesOfRow(shopSettings), method: 'delivery' },
  });
  if (!quote.ok) throw new Error(`Seed data: quote ${spec.id}: ${quote.reason}`);
  const sum = (pick: (placement: (typeof figures.quotePlacements)[number]) => number) =>
    figures.quotePlacements.reduce((total, placement) => total + pick(placement), 0);
  const stitches = sum((placement) => placement.stitches);
  const hoopings = sum((placement) => placement.hoopings);
  const colourChanges = sum((placement) => placement.colorChanges);
  // Machine time for the whole quantity; setup is counted once per job.
  const runTime = estimateRunMinutes({
    stitches: stitches * spec.quantity,
    colorChanges: colourChanges * spec.quantity,
    hoopings: hoopings * spec.quantity,
    trims: figures.trims * spec.quantity,
    machine,
  });
  if (!runTime.ok) throw new Error(`Seed data: quote ${spec.id}: ${runTime.reason}`);
  const createdAt = at(spec.createdAt);
  const colour = figures.garment.colours.find((candidate) => candidate.id === figures.colourId)!;
  return {
    row: {
      id: spec.id,
      design_id: saved?.id ?? null,
      customer_id: saved ? userIds[saved.customer] : null,
      pricing_rule_set_id: publishedRuleSet.id,
      quantity: spec.quantity,
      is_rush: spec.isRush,
      input: JSON.stringify({
        garment: figures.garment.slug,
        sizeCode: figures.size.code,
        fabricColour: colour.name,
        document: figures.document,
        quantity: spec.quantity,
        isRush: spec.isRush,
        placements: figures.quotePlacements,
        shipping: quote.shipping && {
          ...quote.shipping,
          freeDeliveryFromCents: shopSettings.delivery_free_from_cents,
          pickupNote: shopSettings.pickup_note,
        },
      }),
      lines: JSON.stringify(quote.lines),
      subtotal_cents: quote.subtotalCents,
      shipping_cents: quote.shippingCents,
      shipping_method: 'delivery',
      tax_cents: quote.taxCents,
      total_cents: quote.totalCents,
      currency: quote.currency,
      stitch_count: stitches,
      hooping_count: hoopings,
      colour_change_count: colourChanges,
      run_minutes: runTime.totalMinutes.toFixed(2),
      expires_at: addDays(createdAt, validityDays),
      created_at: createdAt,
      updated_at: createdAt,
    },
    designId: saved?.id ?? null,
    customer: saved?.customer ?? null,
    garmentSizeId: figures.size.id,
    description: `${saved?.name ?? 'Design'}: ${figures.garment.name}, ${figures.size.label}, ${colour.name}`,
  };
}
