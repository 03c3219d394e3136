import { fail, type EngineResult } from './engine-result.ts';
import { isRecord, isWholeNumber } from './input-checks.ts';

/** A quantity break: orders of at least `minQty` garments get `discountBp` off the embroidery work. */
export interface QuantityBreak {
  minQty: number;
  /** Discount in basis points: 1,000 = 10 %. */
  discountBp: number;
}

/**
 * One published version of a shop's prices. Plain JSON (numbers, strings, arrays, objects), so the server can
 * store it and the apps can read it. All amounts are integer cents (minor units) of `currency`.
 */
export interface PricingRuleSet {
  /** Increases with each published change; quotes record the version they used. */
  version: number;
  /** ISO 4217 code, e.g. "USD". */
  currency: string;
  /**
   * Blank garment price, per garment, by garment slug and then size code: `{ "bishop-dress": { "6m": 3800 } }`.
   * Each blank has its own prices, so a 2T bib can cost less than a 2T dress.
   */
  garmentBaseCents: Record<string /* garment slug */, Record<string /* size code */, number>>;
  /** Embroidery price per 1,000 stitches, per garment (stitch count is the trade's standard basis). */
  centsPerThousandStitches: number;
  /** Least a placement costs per garment, however few its stitches. */
  minimumPerPlacementCents: number;
  /** Per hooping beyond a placement's first, per garment. */
  extraHoopingCents: number;
  /** Per colour change, per garment. */
  colorChangeCents: number;
  /** Once per order for each placement using the customer's own artwork (checking and digitizing it). */
  artworkSetupCents: number;
  /** Lettering has its own rate and minimum, per garment. */
  lettering: { centsPerThousandStitches: number; minimumCents: number };
  /** Applied to the embroidery work of a rush order: 15,000 = × 1.5; 10,000 = no surcharge. */
  rushMultiplierBp: number;
  quantityBreaks: QuantityBreak[];
  /** Sales tax on the subtotal, basis points: 825 = 8.25 %. */
  taxRateBp: number;
}

const CENT_FIELDS = [
  'centsPerThousandStitches',
  'minimumPerPlacementCents',
  'extraHoopingCents',
  'colorChangeCents',
  'artworkSetupCents',
] as const;

/** Checks a rule set before use: whole, non-negative amounts, a currency code, sane multipliers and breaks. */
export function checkPricingRuleSet(ruleSet: PricingRuleSet): EngineResult<object> {
  if (!isRecord(ruleSet)) return fail('The price list is missing.');
  if (!isWholeNumber(ruleSet.version, 1)) return fail('The price list version must be a whole number, 1 or more.');
  if (typeof ruleSet.currency !== 'string' || !/^[A-Z]{3}$/.test(ruleSet.currency))
    return fail('The currency must be a three-letter ISO 4217 code such as USD.');
  if (!isRecord(ruleSet.garmentBaseCents)) return fail('The price list has no garment prices by garment and size.');
  for (const [garment, sizes] of Object.entries(ruleSet.garmentBaseCents)) {
    if (!isRecord(sizes)) return fail(`The garment prices for ${garment} must be listed by size code.`);
    for (const [size, cents] of Object.entries(sizes)) {
      if (!isWholeNumber(cents))
        return fail(`The garment price for ${garment} in size ${size} must be whole cents, 0 or more.`);
    }
  }
  for (const field of CENT_FIELDS) {
    if (!isWholeNumber(ruleSet[field])) return fail(`The price list's ${field} must be whole cents, 0 or more.`);
  }
  if (
    !isRecord(ruleSet.lettering) ||
    !isWholeNumber(ruleSet.lettering.centsPerThousandStitches) ||
    !isWholeNumber(ruleSet.lettering.minimumCents)
  ) {
    return fail('The lettering rate and minimum must be whole cents, 0 or more.');
  }
  if (!isWholeNumber(ruleSet.rushMultiplierBp, 10_000))
    return fail('The rush multiplier must be at least 10,000 basis points (× 1).');
  if (!isWholeNumber(ruleSet.taxRateBp) || ruleSet.taxRateBp > 10_000)
    return fail('The tax rate must be 0 to 10,000 basis points.');
  if (!Array.isArray(ruleSet.quantityBreaks)) return fail('The quantity breaks must be a list.');
  for (const bracket of ruleSet.quantityBreaks) {
    if (
      !isRecord(bracket) ||
      !isWholeNumber(bracket.minQty, 1) ||
      !isWholeNumber(bracket.discountBp) ||
      bracket.discountBp > 10_000
    ) {
      return fail(
        'Each quantity break needs a minimum quantity of 1 or more and a discount of 0 to 10,000 basis points.',
      );
    }
  }
  return { ok: true };
}

/** The break with the largest minimum the quantity reaches, if any. */
export function quantityBreakFor(ruleSet: PricingRuleSet, quantity: number): QuantityBreak | undefined {
  return ruleSet.quantityBreaks.reduce<QuantityBreak | undefined>(
    (best, bracket) => (bracket.minQty <= quantity && (!best || bracket.minQty > best.minQty) ? bracket : best),
    undefined,
  );
}

/** The blank price of a garment in a size, read without touching inherited object keys at either level. */
export function garmentBaseFor(ruleSet: PricingRuleSet, garmentSlug: string, sizeCode: string): number | undefined {
  if (!Object.hasOwn(ruleSet.garmentBaseCents, garmentSlug)) return undefined;
  const sizes = ruleSet.garmentBaseCents[garmentSlug];
  return Object.hasOwn(sizes, sizeCode) ? sizes[sizeCode] : undefined;
}
