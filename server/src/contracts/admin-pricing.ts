import { z } from 'zod';

const capital = (what: string) => what[0]!.toUpperCase() + what.slice(1);
const cents = (what: string) =>
  z
    .number({ error: `Enter ${what} in whole cents` })
    .int(`Enter ${what} in whole cents`)
    .min(0, `${capital(what)} can't be negative`)
    .max(10_000_000, `${capital(what)} must be under $100,000`);
const basisPoints = (what: string, min: number, max: number) =>
  z
    .number({ error: `Enter ${what}` })
    .int(`Enter ${what} to two decimal places`)
    .min(min, `${capital(what)} must be at least ${min / 100} %`)
    .max(max, `${capital(what)} must be at most ${max / 100} %`);

/**
 * Everything a price list holds except its version, which the server assigns. The engine's checkPricingRuleSet
 * checks the same rules again before anything is saved; this schema gives each field its own message.
 */
export const pricingRules = z.object({
  currency: z.string().regex(/^[A-Z]{3}$/, 'Use a three-letter currency code such as USD'),
  garmentBaseCents: z.record(z.string().min(1), z.record(z.string().min(1), cents('the blank price'))),
  centsPerThousandStitches: cents('the stitch rate'),
  minimumPerPlacementCents: cents('the placement minimum'),
  extraHoopingCents: cents('the re-hooping fee'),
  colorChangeCents: cents('the colour change fee'),
  artworkSetupCents: cents('the artwork setup fee'),
  lettering: z.object({
    centsPerThousandStitches: cents('the lettering rate'),
    minimumCents: cents('the lettering minimum'),
  }),
  /** 15,000 = × 1.5. */
  rushMultiplierBp: z
    .number({ error: 'Enter the rush surcharge' })
    .int('Enter the rush surcharge to two decimal places')
    .min(10_000, 'The rush surcharge can’t be below 0 %')
    .max(40_000, 'The rush surcharge must be at most 300 %'),
  quantityBreaks: z
    .array(
      z.object({
        minQty: z
          .number()
          .int('Use a whole number of garments')
          .min(2, 'A break starts at 2 garments or more')
          .max(10_000, 'Use at most 10,000 garments'),
        discountBp: basisPoints('the discount', 1, 9_000),
      }),
    )
    .max(10, 'Use at most 10 quantity breaks')
    .refine(
      (breaks) => new Set(breaks.map((b) => b.minQty)).size === breaks.length,
      'Two breaks start at the same quantity',
    ),
  taxRateBp: basisPoints('the tax rate', 0, 5_000),
});
export type PricingRules = z.infer<typeof pricingRules>;

export const ruleSetStatus = z.enum(['draft', 'published', 'retired']);

export const ruleSetSummary = z.object({
  id: z.number().int(),
  version: z.number().int(),
  status: ruleSetStatus,
  currency: z.string(),
  notes: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
  publishedAt: z.string().nullable(),
  createdByName: z.string().nullable(),
  /** Stored quotes priced with this version. */
  quoteCount: z.number().int(),
});
export type RuleSetSummary = z.infer<typeof ruleSetSummary>;

export const ruleSetListResponse = z.object({ ruleSets: z.array(ruleSetSummary), canEdit: z.boolean() });
export type RuleSetListResponse = z.infer<typeof ruleSetListResponse>;

export const ruleSetDetailResponse = z.object({ ruleSet: ruleSetSummary.extend({ rules: pricingRules }) });
export type RuleSetDetailResponse = z.infer<typeof ruleSetDetailResponse>;

export const ruleSetIdParams = z.object({
  id: z.coerce
    .number({ error: 'Use a price list id such as 2' })
    .int('Use a price list id such as 2')
    .min(1, 'Use a price list id such as 2'),
});

export const updateDraftRequest = z.object({
  rules: pricingRules,
  notes: z.string().trim().max(2000, 'Keep the notes under 2,000 characters').nullable(),
});
export type UpdateDraftRequest = z.infer<typeof updateDraftRequest>;

export const pricingPreviewRequest = z.object({ rules: pricingRules });
export type PricingPreviewRequest = z.infer<typeof pricingPreviewRequest>;

const pricedSide = z.discriminatedUnion('ok', [
  z.object({
    ok: z.literal(true),
    totalCents: z.number().int(),
    subtotalCents: z.number().int(),
    taxCents: z.number().int(),
    lines: z.array(z.object({ code: z.string(), label: z.string(), amountCents: z.number().int() })),
  }),
  z.object({ ok: z.literal(false), reason: z.string() }),
]);

export const samplePreview = z.object({
  quoteId: z.number().int(),
  /** "Smallest", "Typical", "Largest": where the sample sits among recent quotes. */
  role: z.string(),
  description: z.string(),
  quantity: z.number().int(),
  isRush: z.boolean(),
  published: pricedSide,
  draft: pricedSide,
  /** Draft total minus published total; null when either side cannot be priced. */
  differenceCents: z.number().int().nullable(),
});
export type SamplePreview = z.infer<typeof samplePreview>;

export const pricingPreviewResponse = z.object({
  currency: z.string(),
  publishedVersion: z.number().int(),
  samples: z.array(samplePreview),
});
export type PricingPreviewResponse = z.infer<typeof pricingPreviewResponse>;
