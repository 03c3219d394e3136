import type { PricingRules } from '@server/contracts/admin-pricing.ts';

/**
 * The price list as the form edits it: money in dollars and rates in percent, as text, exactly as typed. Field
 * names follow the rules' own paths, so a server error for `rules.lettering.minimumCents` lands on the input
 * named `lettering.minimumCents`.
 */
export interface RulesForm {
  currency: string;
  garmentBaseCents: Record<string, Record<string, string>>;
  centsPerThousandStitches: string;
  minimumPerPlacementCents: string;
  extraHoopingCents: string;
  colorChangeCents: string;
  artworkSetupCents: string;
  lettering: { centsPerThousandStitches: string; minimumCents: string };
  /** The surcharge in percent: a multiplier of 15,000 bp shows as "50". */
  rushMultiplierBp: string;
  quantityBreaks: { minQty: string; discountBp: string }[];
  taxRateBp: string;
}

export type MoneyField =
  | 'centsPerThousandStitches'
  | 'minimumPerPlacementCents'
  | 'extraHoopingCents'
  | 'colorChangeCents'
  | 'artworkSetupCents';

// Minor units have two decimals in the currencies the studio takes (USD).
const toDollars = (cents: number) => (cents / 100).toFixed(2);
const toPercent = (bp: number) => String(bp / 100);

/** A typed amount as whole minor units; NaN for text that is not a number, which the server then names. */
const fromDecimal = (text: string) => (text.trim() === '' ? Number.NaN : Math.round(Number(text.trim()) * 100));

export function toRulesForm(rules: PricingRules): RulesForm {
  return {
    currency: rules.currency,
    garmentBaseCents: Object.fromEntries(
      Object.entries(rules.garmentBaseCents).map(([garment, sizes]) => [
        garment,
        Object.fromEntries(Object.entries(sizes).map(([size, cents]) => [size, toDollars(cents)])),
      ]),
    ),
    centsPerThousandStitches: toDollars(rules.centsPerThousandStitches),
    minimumPerPlacementCents: toDollars(rules.minimumPerPlacementCents),
    extraHoopingCents: toDollars(rules.extraHoopingCents),
    colorChangeCents: toDollars(rules.colorChangeCents),
    artworkSetupCents: toDollars(rules.artworkSetupCents),
    lettering: {
      centsPerThousandStitches: toDollars(rules.lettering.centsPerThousandStitches),
      minimumCents: toDollars(rules.lettering.minimumCents),
    },
    rushMultiplierBp: toPercent(rules.rushMultiplierBp - 10_000),
    quantityBreaks: rules.quantityBreaks.map((bracket) => ({
      minQty: String(bracket.minQty),
      discountBp: toPercent(bracket.discountBp),
    })),
    taxRateBp: toPercent(rules.taxRateBp),
  };
}

/** The form back as rules, in minor units and basis points; the server checks every value. */
export function fromRulesForm(form: RulesForm): PricingRules {
  return {
    currency: form.currency.trim().toUpperCase(),
    garmentBaseCents: Object.fromEntries(
      Object.entries(form.garmentBaseCents).map(([garment, sizes]) => [
        garment,
        Object.fromEntries(Object.entries(sizes).map(([size, text]) => [size, fromDecimal(text)])),
      ]),
    ),
    centsPerThousandStitches: fromDecimal(form.centsPerThousandStitches),
    minimumPerPlacementCents: fromDecimal(form.minimumPerPlacementCents),
    extraHoopingCents: fromDecimal(form.extraHoopingCents),
    colorChangeCents: fromDecimal(form.colorChangeCents),
    artworkSetupCents: fromDecimal(form.artworkSetupCents),
    lettering: {
      centsPerThousandStitches: fromDecimal(form.lettering.centsPerThousandStitches),
      minimumCents: fromDecimal(form.lettering.minimumCents),
    },
    rushMultiplierBp: 10_000 + fromDecimal(form.rushMultiplierBp),
    quantityBreaks: form.quantityBreaks.map((bracket) => ({
      minQty: bracket.minQty.trim() === '' ? Number.NaN : Number(bracket.minQty),
      discountBp: fromDecimal(bracket.discountBp),
    })),
    taxRateBp: fromDecimal(form.taxRateBp),
  };
}

/** Whether every amount is a number, so the preview can be asked for; JSON would turn NaN into null. */
export function isComplete(rules: PricingRules): boolean {
  const numbers: number[] = [
    rules.centsPerThousandStitches,
    rules.minimumPerPlacementCents,
    rules.extraHoopingCents,
    rules.colorChangeCents,
    rules.artworkSetupCents,
    rules.lettering.centsPerThousandStitches,
    rules.lettering.minimumCents,
    rules.rushMultiplierBp,
    rules.taxRateBp,
    ...rules.quantityBreaks.flatMap((bracket) => [bracket.minQty, bracket.discountBp]),
    ...Object.values(rules.garmentBaseCents).flatMap((sizes) => Object.values(sizes)),
  ];
  return numbers.every(Number.isFinite);
}

/** "bishop-dress" → "Bishop dress": the price list keys blanks by slug. */
export const garmentLabel = (slug: string) => (slug.charAt(0).toUpperCase() + slug.slice(1)).replaceAll('-', ' ');
