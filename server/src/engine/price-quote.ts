import { fail, type EngineResult } from './engine-result.ts';
import { isRecord, isWholeNumber } from './input-checks.ts';
import { BASIS_POINTS, divideRoundHalfUp, toSafeCents } from './money.ts';
import { checkPricingRuleSet, garmentBaseFor, quantityBreakFor, type PricingRuleSet } from './pricing-rules.ts';
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
  | 'tax';

export interface QuoteLine {
  code: QuoteLineCode;
  label: string;
  /** Whole cents for the whole quantity; negative for discounts. */
  amountCents: number;
  /** Set on stitching and lettering lines. */
  placementId?: string;
}

export interface Quote {
  /** Every charge including tax; they add up to `totalCents`. */
  lines: QuoteLine[];
  /** All lines except tax. */
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  currency: string;
  ruleSetVersion: number;
}

/**
 * Prices an order line of identical garments from a rule set. Each line is computed exactly and rounded once,
 * half-up, to the cent; the subtotal and total are sums of rounded lines, so the lines always add up.
 * Quantity discounts and the rush surcharge apply to the embroidery work (stitching, lettering, extra hoopings,
 * colour changes), not to the blank garment, the one-off artwork setup or tax.
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
  const lines: { code: QuoteLineCode; label: string; cents: bigint; placementId?: string }[] = [
    {
      code: 'garment',
      label: `${garment.name}, size ${sizeLabel ?? sizeCode}${per}`,
      cents: BigInt(garmentCents) * qty,
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
    lines.push({ code: placement.kind, label, cents, placementId: placement.id });
    workCents += cents;
  }
  const extraHoopings = placements.reduce((sum, placement) => sum + BigInt(placement.hoopings) - 1n, 0n);
  const colorChanges = placements.reduce((sum, placement) => sum + BigInt(placement.colorChanges), 0n);
  const optional: { code: QuoteLineCode; label: string; cents: bigint }[] = [
    {
      code: 'extra-hoopings',
      label: `Re-hooping: ${formatCount(Number(extraHoopings), 'extra hooping')}${per}`,
      cents: extraHoopings * BigInt(ruleSet.extraHoopingCents) * qty,
    },
    {
      code: 'color-changes',
      label: `Thread changes: ${formatCount(Number(colorChanges), 'colour change')}${per}`,
      cents: colorChanges * BigInt(ruleSet.colorChangeCents) * qty,
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
  const tax = divideRoundHalfUp(subtotal * BigInt(ruleSet.taxRateBp), BASIS_POINTS);
  if (tax !== 0n) lines.push({ code: 'tax', label: `Tax ${formatNumber(ruleSet.taxRateBp / 100, 2)} %`, cents: tax });

  const total = subtotal + tax;
  if ([total, ...lines.map((line) => line.cents)].some((cents) => toSafeCents(cents) === undefined))
    return fail('The quote is too large to price.');
  return {
    ok: true,
    lines: lines.map(({ code, label, cents, placementId }) => ({
      code,
      label,
      amountCents: Number(cents),
      ...(placementId === undefined ? {} : { placementId }),
    })),
    subtotalCents: Number(subtotal),
    taxCents: Number(tax),
    totalCents: Number(total),
    currency: ruleSet.currency,
    ruleSetVersion: ruleSet.version,
  };
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
