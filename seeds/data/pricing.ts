import type { PricingRuleSet } from '../../server/src/engine/index.ts';
import { garments } from './garments.ts';

/**
 * Blank garment prices by garment slug and size code, for every seeded garment and size. The knit romper is the
 * cheapest of the clothes, the hand-smocked lawn bishop dress the dearest; bibs and bonnets are small blanks.
 */
const garmentBaseCents: PricingRuleSet['garmentBaseCents'] = {
  'smocked-yoke-dress': { '6m': 3400, '12m': 3600, '18m': 3800, '2T': 4200, '3T': 4400, '4T': 4600 },
  'bubble-romper': { '6m': 2400, '12m': 2600, '18m': 2800, '2T': 3000 },
  'bishop-dress': { '6m': 3800, '12m': 4000, '18m': 4200, '2T': 4600, '3T': 4800 },
  'terry-bib': { small: 1200, medium: 1300, large: 1400, xlarge: 1500 },
  'sun-bonnet': { '0-3m': 2200, '3-6m': 2200, '6-12m': 2400, '12-24m': 2600 },
};

// A garment or size added to the seeds without a price would only fail later, when a quote for it is priced.
for (const garment of garments) {
  for (const size of garment.sizes) {
    if (garmentBaseCents[garment.slug]?.[size.code] === undefined)
      throw new Error(`Seed data: no blank price for ${garment.slug} in size ${size.code}`);
  }
}

const publishedRules: PricingRuleSet = {
  version: 1,
  currency: 'USD',
  garmentBaseCents,
  centsPerThousandStitches: 120,
  minimumPerPlacementCents: 800,
  extraHoopingCents: 300,
  colorChangeCents: 50,
  artworkSetupCents: 2500,
  lettering: { centsPerThousandStitches: 150, minimumCents: 900 },
  rushMultiplierBp: 15_000,
  quantityBreaks: [
    { minQty: 3, discountBp: 500 },
    { minQty: 6, discountBp: 1000 },
  ],
  taxRateBp: 700,
};

// The owner's winter draft: re-hooping and the stitch rate go up, a two-garment break is added for siblings.
const draftRules: PricingRuleSet = {
  ...publishedRules,
  version: 2,
  centsPerThousandStitches: 130,
  extraHoopingCents: 350,
  quantityBreaks: [
    { minQty: 2, discountBp: 300 },
    { minQty: 3, discountBp: 500 },
    { minQty: 6, discountBp: 1000 },
  ],
};

export const pricingRuleSets = [
  {
    id: 1,
    rules: publishedRules,
    status: 'published' as const,
    notes: 'Opening price list.',
    publishedAt: '2026-11-01T16:00',
    createdAt: '2026-11-01T15:30',
  },
  {
    id: 2,
    rules: draftRules,
    status: 'draft' as const,
    notes: 'Winter draft: re-hooping 3.50, stitches 1.30 per 1,000, 3 % off two or more.',
    publishedAt: null,
    createdAt: '2026-11-27T20:10',
  },
];

/** The rule set every seeded quote was priced with. */
export const publishedRuleSet = pricingRuleSets[0];
