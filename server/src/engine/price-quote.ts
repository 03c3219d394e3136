import { fail, type EngineResult } from './engine-result.ts';
import { isRecord, isWholeNumber } from './input-checks.ts';
import { BASIS_POINTS, divideRoundHalfUp, toSafeCents } from './money.ts';
import { checkPricingRuleSet, garmentBaseFor, quantityBreakFor, type PricingRuleSet } from './pricing-rules.ts';
import { shippingOptions, type ShippingMethodCode, type ShippingOption, type ShippingRates } from './price-shipping.ts';
import { formatCount, formatNumber } from './wording.ts';

export type PlacementKind = 'stitching' | 'lettering';

/** One embroidered placement on the garment, with the figures from the stitch estimate and hooping plan. */
export interface QuotePlacement {
  /** The caller's id, echoed on the placement's line. */
  id: string;
  /** Shown on the line: "Hem border", "Name on bib". */
  label: string;
  kind: PlacementKind;
  stitches: number;
  hoopings: number;
  /**
   * Colour changes this placement adds, per garment: those between its own colours plus, when the placement before
   * it (in stitching order) ended in another thread, the change into its first thread.
   */
  colorChanges: number;
  /** The customer supplied the artwork, so the one-off setup fee applies. */
  hasCustomerArtwork: boolean;
  /**
   * The stitches are not known yet (a picture the studio still has to digitize): the line charges the minimum and
   * says so instead of quoting a count.
   */
  isStitchCountPending?: boolean;
}

export interface QuoteInput {
  ruleSet: PricingRuleSet;
  /** The blank being embroidered: the slug keys the price list, the name is shown on the garment line. */
  garment: { slug: string; name: string };
  sizeCode: string;
  /** Shown on the garment line instead of the code: "6 months". */
  sizeLabel?: string;
  /** Identical garments in the order. */
  quantity: number;
  placements: QuotePlacement[];
  isRush: boolean;
  /** The shop's shipping rates and the method the customer chose; without it the quote has no shipping line. */
  shipping?: { rates: ShippingRates; method: ShippingMethodCode };
}

export type QuoteLineCode =
  | 'garment'
  | 'stitching'
  | 'lettering'
  | 'extra-hoopings'
  | 'color-changes'
  | 'quantity-discount'
  | 'rush'
  | 'artwork-setup'
  | 'shipping'
  | 'tax';

/** The unit rate a line is priced at, shown beside its count: "1.20 per 1,000 stitches". */
export interface QuoteLineRate {
  cents: number;
  per: '1,000 stitches' | 'garment' | 'extra hooping' | 'colour change';
  /** The least the line costs per garment, when the count alone would come to less. */
  minimumCents?: number;
}

export interface QuoteLine {
  code: QuoteLineCode;
  label: string;
  /** Whole cents for the whole quantity; negative for discounts. */
  amountCents: number;
  /** Set on stitching and lettering lines. */
  placementId?: string;
  /** Set on lines priced per unit: the garment, stitches, extra hoopings and colour changes. */
  rate?: QuoteLineRate;
}

export interface Quote {
  /** Every charge including shipping and tax; they add up to `totalCents`. */
  lines: QuoteLine[];
  /** All lines except shipping and tax: the goods and the work, which tax is charged on. */
  subtotalCents: number;
  /** 0 without a shipping line. */
  shippingCents: number;
  taxCents: number;
  totalCents: number;
  currency: string;
  ruleSetVersion: number;
  /** Set when the input had shipping: the method on the shipping line and every method offered, priced. */
  shipping?: { method: ShippingMethodCode; options: ShippingOption[] };
}

type PricedLine = { code: QuoteLineCode; label: string; cents: bigint; placementId?: string; rate?: QuoteLineRate };

/**
 * Prices an order line of identical garments from a rule set. Each line is computed exactly and rounded once,
 * half-up, to the cent; the subtotal and total are sums of rounded lines, so the lines always add up.
 * Quantity discounts and the rush surcharge apply to the embroidery work (stitching, lettering, extra hoopings,
 * colour changes), not to the blank garment, the one-off artwork setup or tax.
 * Shipping comes after the subtotal and is not taxed: the price list's tax is "sales tax on the subtotal" (the goods
 * and the work), and the free-delivery amount is compared with that same subtotal.
 */
export function priceQuote(input: QuoteInput): EngineResult<Quote> {
  if (!isRecord(input)) return fail('The quote request is missing.');
  const { ruleSet, garment, sizeCode, sizeLabel, quantity, placements, isRush } = input;
  const ruleCheck = checkPricingRuleSet(ruleSet);
  if (!ruleCheck.ok) return ruleCheck;
  if (!isRecord(garment) || typeof garment.slug !== 'string' || typeof garment.name !== 'string')
    return fail('Choose a garment.');
  if (typeof sizeCode !== 'string') return fail('Choose a garment size.');
  if (sizeLabel !== undefined && typeof sizeLabel !== 'string') return fail('The size label must be text.');
  const garmentCents = garmentBaseFor(ruleSet, garment.slug, sizeCode);
  if (garmentCents === undefined)
    return fail(`Price list ${ruleSet.version} has no price for the ${garment.name} in size ${sizeLabel ?? sizeCode}.`);
  if (!isWholeNumber(quantity, 1)) return fail('The quantity must be a whole number, 1 or more.');
  if (typeof isRush !== 'boolean') return fail('Say whether the order is a rush order.');
  if (!Array.isArray(placements)) return fail('The placements must be a list.');
  const badPlacement = placements.findIndex((placement) => !isValidPlacement(placement));
  if (badPlacement >= 0) {
    return fail(
      `Placement ${badPlacement + 1} needs an id, a label, a kind (stitching or lettering), whole stitches and colour changes, and at least one hooping.`,
    );
  }

  const qty = BigInt(quantity);
  const per = ` × ${formatCount(quantity, 'garment')}`;
  const lines: PricedLine[] = [
    {
      code: 'garment',
      label: `${garment.name}, size ${sizeLabel ?? sizeCode}${per}`,
      cents: BigInt(garmentCents) * qty,
      rate: { cents: garmentCents, per: 'garment' },
    },
  ];
  let workCents = 0n;
  for (const placement of placements) {
    const rate =
      placement.kind === 'lettering' ? ruleSet.lettering.centsPerThousandStitches : ruleSet.centsPerThousandStitches;
    const minimum = placement.kind === 'lettering' ? ruleSet.lettering.minimumCents : ruleSet.minimumPerPlacementCents;
    // Per garment in thousandths of a cent: the stitch price or the minimum, whichever is more.
    const stitchMilliCents = BigInt(placement.stitches) * BigInt(rate);
    const perGarment = stitchMilliCents > BigInt(minimum) * 1000n ? stitchMilliCents : BigInt(minimum) * 1000n;
    const cents = divideRoundHalfUp(perGarment * qty, 1000n);
    const stitches = placement.isStitchCountPending
      ? 'minimum charge until the studio counts the stitches'
      : formatCount(placement.stitches, 'stitch', 'stitches');
    const label = `${placement.label}: ${stitches}${per}`;
    const lineRate: QuoteLineRate = {
      cents: rate,
      per: '1,000 stitches',
      ...(minimum > 0 ? { minimumCents: minimum } : {}),
    };
    lines.push({ code: placement.kind, label, cents, placementId: placement.id, rate: lineRate });
    workCents += cents;
  }
  const hoopings = placements.reduce((sum, placement) => sum + placement.hoopings, 0);
  const extraHoopings = BigInt(hoopings - placements.length);
  const colorChanges = placements.reduce((sum, placement) => sum + BigInt(placement.colorChanges), 0n);
  const optional: PricedLine[] = [
    {
      code: 'extra-hoopings',
      label: `Re-hooping: ${rehoopingWords(hoopings, placements.length)}${per}`,
      cents: extraHoopings * BigInt(ruleSet.extraHoopingCents) * qty,
      rate: { cents: ruleSet.extraHoopingCents, per: 'extra hooping' },
    },
    {
      code: 'color-changes',
      label: `Thread changes: ${formatCount(Number(colorChanges), 'colour change')}${per}`,
      cents: colorChanges * BigInt(ruleSet.colorChangeCents) * qty,
      rate: { cents: ruleSet.colorChangeCents, per: 'colour change' },
    },
  ];
  for (const line of optional) workCents += line.cents;

  const bracket = quantityBreakFor(ruleSet, quantity);
  const discount = bracket ? divideRoundHalfUp(workCents * BigInt(bracket.discountBp), BASIS_POINTS) : 0n;
  if (bracket) {
    optional.push({
      code: 'quantity-discount',
      label: `Quantity discount: ${formatNumber(bracket.discountBp / 100, 2)} % off embroidery for ${bracket.minQty} or more`,
      cents: -discount,
    });
  }
  if (isRush) {
    const surchargeBp = BigInt(ruleSet.rushMultiplierBp) - BASIS_POINTS;
    optional.push({
      code: 'rush',
      label: `Rush: ${formatNumber(Number(surchargeBp) / 100, 2)} % on embroidery`,
      cents: divideRoundHalfUp((workCents - discount) * surchargeBp, BASIS_POINTS),
    });
  }
  const setups = placements.filter((placement) => placement.hasCustomerArtwork).length;
  optional.push({
    code: 'artwork-setup',
    label: `Artwork setup: ${formatCount(setups, 'design')}, once per order`,
    cents: BigInt(setups) * BigInt(ruleSet.artworkSetupCents),
  });
  // Lines that come to nothing would only clutter the customer's view.
  lines.push(...optional.filter((line) => line.cents !== 0n));

  const subtotal = lines.reduce((sum, line) => sum + line.cents, 0n);
  const shipped = input.shipping === undefined ? undefined : priceShippingLine(input.shipping, subtotal);
  if (shipped && !shipped.ok) return shipped;
  if (shipped) lines.push(shipped.line);
  const shippingCents = shipped ? shipped.line.cents : 0n;
  const tax = divideRoundHalfUp(subtotal * BigInt(ruleSet.taxRateBp), BASIS_POINTS);
  if (tax !== 0n) lines.push({ code: 'tax', label: `Tax ${formatNumber(ruleSet.taxRateBp / 100, 2)} %`, cents: tax });

  const total = subtotal + shippingCents + tax;
  if ([total, ...lines.map((line) => line.cents)].some((cents) => toSafeCents(cents) === undefined))
    return fail('The quote is too large to price.');
  return {
    ok: true,
    lines: lines.map(({ code, label, cents, placementId, rate }) => ({
      code,
      label,
      amountCents: Number(cents),
      ...(placementId === undefined ? {} : { placementId }),
      ...(rate === undefined ? {} : { rate }),
    })),
    subtotalCents: Number(subtotal),
    shippingCents: Number(shippingCents),
    taxCents: Number(tax),
    totalCents: Number(total),
    currency: ruleSet.currency,
    ruleSetVersion: ruleSet.version,
    ...(shipped ? { shipping: shipped.shipping } : {}),
  };
}

/** The shipping line for the chosen method, priced on the subtotal, with every method the shop offers. */
function priceShippingLine(
  request: NonNullable<QuoteInput['shipping']>,
  subtotal: bigint,
): EngineResult<{ line: PricedLine; shipping: NonNullable<Quote['shipping']> }> {
  const priced = shippingOptions(request.rates, toSafeCents(subtotal) ?? Number.MAX_SAFE_INTEGER);
  if (!priced.ok) return priced;
  const chosen = priced.options.find((option) => option.method === request.method);
  if (!chosen) return fail('The shop does not offer that way of getting the order to you now.');
  const isFreeDelivery = chosen.method === 'delivery' && chosen.cents === 0;
  return {
    ok: true,
    line: {
      code: 'shipping',
      label: isFreeDelivery ? `${chosen.name}: free for this order` : chosen.name,
      cents: BigInt(chosen.cents),
    },
    shipping: { method: chosen.method, options: priced.options },
  };
}

/**
 * The re-hooping line's count in the same terms as "How it will be stitched", which lists every hooping: the first
 * hooping of each placement is in that placement's price, so only the rest are charged here.
 */
export function rehoopingWords(hoopingsInAll: number, placementCount: number): string {
  const extra = hoopingsInAll - placementCount;
  const firsts = placementCount === 1 ? 'the first is' : `the first of each of the ${placementCount} placements is`;
  return `${formatCount(extra, 'extra hooping')} of ${formatCount(hoopingsInAll, 'hooping')} in all (${firsts} included)`;
}

function isValidPlacement(placement: unknown): placement is QuotePlacement {
  return (
    isRecord(placement) &&
    typeof placement.id === 'string' &&
    typeof placement.label === 'string' &&
    (placement.kind === 'stitching' || placement.kind === 'lettering') &&
    isWholeNumber(placement.stitches) &&
    isWholeNumber(placement.hoopings, 1) &&
    isWholeNumber(placement.colorChanges) &&
    typeof placement.hasCustomerArtwork === 'boolean' &&
    (placement.isStitchCountPending === undefined || typeof placement.isStitchCountPending === 'boolean')
  );
}
