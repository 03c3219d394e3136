import { z } from 'zod';
import { priceQuote, type PricingRuleSet, type QuotePlacement, type ShippingRates } from '../../engine/index.ts';
import type { SamplePreview } from '../../contracts/admin-pricing.ts';
import type { StoredQuoteRow } from './pricing-rule-set-repo.ts';

/** The part of a stored quote's input the engine needs to price it again (quotes.input, as the seeds and server write it). */
const storedQuoteInput = z.object({
  garment: z.string(),
  sizeCode: z.string(),
  quantity: z.number().int().min(1),
  isRush: z.boolean(),
  placements: z.array(
    z.object({
      id: z.string(),
      label: z.string(),
      kind: z.enum(['stitching', 'lettering']),
      stitches: z.number().int(),
      hoopings: z.number().int(),
      colorChanges: z.number().int(),
      hasCustomerArtwork: z.boolean(),
    }),
  ),
  /** The way the quote was priced to ship; quotes from before shipping was quoted have none. */
  shipping: z.object({ method: z.enum(['delivery', 'pickup']) }).optional(),
});
export type StoredQuoteInput = z.infer<typeof storedQuoteInput>;

export interface SampleQuote {
  id: number;
  role: string;
  designName: string | null;
  input: StoredQuoteInput;
}

/**
 * Three stored quotes that stand for the shop's work: the smallest, the middle and the largest by total among the
 * recent ones, so a change to any rule shows on a small, a typical and a big job. Quotes whose input cannot be
 * read are skipped.
 */
export function chooseSampleQuotes(rows: readonly StoredQuoteRow[]): SampleQuote[] {
  const usable = rows
    .map((row) => ({ row, input: storedQuoteInput.safeParse(row.input) }))
    .filter((entry) => entry.input.success)
    .sort((a, b) => a.row.totalCents - b.row.totalCents || a.row.id - b.row.id);
  if (usable.length === 0) return [];
  const picks = [
    { role: 'Smallest', index: 0 },
    { role: 'Typical', index: Math.floor((usable.length - 1) / 2) },
    { role: 'Largest', index: usable.length - 1 },
  ].filter((pick, i, all) => all.findIndex((other) => other.index === pick.index) === i);
  return picks.map(({ role, index }) => {
    const { row, input } = usable[index]!;
    return { id: row.id, role, designName: row.designName, input: input.data! };
  });
}

type GarmentLabels = ReadonlyMap<string, { name: string; sizeLabels: ReadonlyMap<string, string> }>;

/** The shop's shipping rates now, for pricing samples with the way each was priced to ship. */
type SampleShipping = ShippingRates | undefined;

function priceWith(
  ruleSet: PricingRuleSet,
  sample: SampleQuote,
  labels: GarmentLabels,
  rates: SampleShipping,
): SamplePreview['published'] {
  const method = sample.input.shipping?.method;
  // A way the shop no longer offers is left out: the sample compares the price list, not shipping.
  const shipping = method && rates?.[method].isOffered ? { rates, method } : undefined;
  const garment = labels.get(sample.input.garment);
  const quote = priceQuote({
    ruleSet,
    garment: { slug: sample.input.garment, name: garment?.name ?? sample.input.garment },
    sizeCode: sample.input.sizeCode,
    sizeLabel: garment?.sizeLabels.get(sample.input.sizeCode),
    quantity: sample.input.quantity,
    placements: sample.input.placements as QuotePlacement[],
    isRush: sample.input.isRush,
    ...(shipping ? { shipping } : {}),
  });
  if (!quote.ok) return { ok: false, reason: quote.reason };
  return {
    ok: true,
    totalCents: quote.totalCents,
    subtotalCents: quote.subtotalCents,
    taxCents: quote.taxCents,
    lines: quote.lines.map(({ code, label, amountCents }) => ({ code, label, amountCents })),
  };
}

/** One sample priced with the published list and with the draft, side by side. */
export function compareSample(
  sample: SampleQuote,
  published: PricingRuleSet,
  draft: PricingRuleSet,
  labels: GarmentLabels,
  rates?: SampleShipping,
): SamplePreview {
  const garment = labels.get(sample.input.garment);
  const before = priceWith(published, sample, labels, rates);
  const after = priceWith(draft, sample, labels, rates);
  const what = `${garment?.name ?? sample.input.garment}, ${garment?.sizeLabels.get(sample.input.sizeCode) ?? sample.input.sizeCode}`;
  return {
    quoteId: sample.id,
    role: sample.role,
    description: `${sample.designName ?? 'Unsaved design'}: ${what}`,
    quantity: sample.input.quantity,
    isRush: sample.input.isRush,
    published: before,
    draft: after,
    differenceCents: before.ok && after.ok ? after.totalCents - before.totalCents : null,
  };
}
