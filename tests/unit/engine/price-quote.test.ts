import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  checkPricingRuleSet,
  priceQuote,
  type PricingRuleSet,
  type QuoteInput,
  type QuotePlacement,
} from '../../../server/src/engine/index.ts';

// Worked arithmetic, not market rates (trade-facts: no neutral published rate exists).
const ruleSet: PricingRuleSet = {
  version: 3,
  currency: 'USD',
  garmentBaseCents: { 'smocked-dress': { '2T': 1800, '4': 2000 }, bib: { '2T': 700, '4': 800 } },
  centsPerThousandStitches: 95,
  minimumPerPlacementCents: 500,
  extraHoopingCents: 150,
  colorChangeCents: 25,
  artworkSetupCents: 2500,
  lettering: { centsPerThousandStitches: 120, minimumCents: 600 },
  rushMultiplierBp: 15_000,
  quantityBreaks: [
    { minQty: 6, discountBp: 1000 },
    { minQty: 3, discountBp: 500 },
  ],
  taxRateBp: 825,
};

const border: QuotePlacement = {
  id: 'hem',
  label: 'Hem border',
  kind: 'stitching',
  stitches: 12_345,
  hoopings: 4,
  colorChanges: 5,
  hasCustomerArtwork: false,
};
const name: QuotePlacement = {
  id: 'name',
  label: 'Name',
  kind: 'lettering',
  stitches: 1187,
  hoopings: 1,
  colorChanges: 0,
  hasCustomerArtwork: false,
};
const upload: QuotePlacement = {
  id: 'pocket',
  label: 'Pocket art',
  kind: 'stitching',
  stitches: 3001,
  hoopings: 1,
  colorChanges: 2,
  hasCustomerArtwork: true,
};
const dress = { slug: 'smocked-dress', name: 'Smocked dress' };
const order: QuoteInput = {
  ruleSet,
  garment: dress,
  sizeCode: '4',
  quantity: 3,
  placements: [border, name, upload],
  isRush: true,
};

const flatRules: PricingRuleSet = {
  ...ruleSet,
  minimumPerPlacementCents: 0,
  extraHoopingCents: 0,
  colorChangeCents: 0,
  quantityBreaks: [],
  rushMultiplierBp: 10_000,
  taxRateBp: 0,
};

describe('priceQuote', () => {
  it('when a rush order of 3 has a border, a name and customer artwork, then every line follows the worked arithmetic', () => {
    const quote = priceQuote(order);
    expect(quote.ok).toBe(true);
    if (!quote.ok) return;
    expect(quote.lines.map(({ code, amountCents }) => [code, amountCents])).toEqual([
      ['garment', 6000], // 2,000 × 3
      ['stitching', 3518], // 12,345 × 95 / 1,000 = 1,172.775 ¢ a garment × 3 = 3,518.325
      ['lettering', 1800], // 1,187 × 120 / 1,000 = 142.44 ¢, under the 600 ¢ minimum, × 3
      ['stitching', 1500], // 3,001 × 95 / 1,000 = 285.095 ¢, under the 500 ¢ minimum, × 3
      ['extra-hoopings', 1350], // (4 − 1) × 150 × 3
      ['color-changes', 525], // 7 × 25 × 3
      ['quantity-discount', -435], // 5 % of 8,693 = 434.65
      ['rush', 4129], // 50 % of 8,258
      ['artwork-setup', 2500], // once per order
      ['tax', 1723], // 8.25 % of 20,887 = 1,723.1775
    ]);
    expect(quote).toMatchObject({
      subtotalCents: 20_887,
      taxCents: 1723,
      totalCents: 22_610,
      currency: 'USD',
      ruleSetVersion: 3,
    });
    expect(quote.lines[0]).toMatchObject({ code: 'garment', label: 'Smocked dress, size 4 × 3 garments' });
    expect(quote.lines[1]).toMatchObject({ placementId: 'hem', label: 'Hem border: 12,345 stitches × 3 garments' });
  });

  it('when a picture’s stitches are not yet counted, then its line charges the minimum and says so, and the setup applies', () => {
    const scan: QuotePlacement = {
      id: 'scan',
      label: 'Your artwork',
      kind: 'stitching',
      stitches: 0,
      hoopings: 1,
      colorChanges: 0,
      hasCustomerArtwork: true,
      isStitchCountPending: true,
    };
    const quote = priceQuote({ ...order, quantity: 1, isRush: false, placements: [scan] });
    if (!quote.ok) throw new Error(quote.reason);
    expect(quote.lines.map(({ code, label, amountCents }) => [code, label, amountCents])).toEqual([
      ['garment', 'Smocked dress, size 4 × 1 garment', 2000],
      ['stitching', 'Your artwork: minimum charge until the studio counts the stitches × 1 garment', 500], // the 500 ¢ minimum
      ['artwork-setup', 'Artwork setup: 1 design, once per order', 2500],
      ['tax', 'Tax 8.25 %', 413], // 8.25 % of 5,000 = 412.5, half up
    ]);
  });

  it('when two garments share a size code, then each is priced from its own list and named on the garment line', () => {
    const bib = priceQuote({ ...order, garment: { slug: 'bib', name: 'Terry bib' }, quantity: 1 });
    const frock = priceQuote({ ...order, quantity: 1 });
    expect(bib.ok && bib.lines[0]).toEqual({
      code: 'garment',
      label: 'Terry bib, size 4 × 1 garment',
      amountCents: 800,
      rate: { cents: 800, per: 'garment' },
    });
    expect(frock.ok && frock.lines[0].amountCents).toBe(2000);
    const labelled = priceQuote({
      ...order,
      ruleSet: { ...ruleSet, garmentBaseCents: { 'bishop-dress': { '6m': 3800 } } },
      garment: { slug: 'bishop-dress', name: 'Bishop dress' },
      sizeCode: '6m',
      sizeLabel: '6 months',
      quantity: 1,
    });
    expect(labelled.ok && labelled.lines[0]).toEqual({
      code: 'garment',
      label: 'Bishop dress, size 6 months × 1 garment',
      amountCents: 3800,
      rate: { cents: 3800, per: 'garment' },
    });
  });

  it('when a line ends on exactly half a cent, then it rounds up; just under half rounds down', () => {
    const at = (stitches: number) => {
      const quote = priceQuote({
        ruleSet: { ...flatRules, centsPerThousandStitches: 5 },
        garment: dress,
        sizeCode: '2T',
        quantity: 1,
        placements: [{ ...border, stitches }],
        isRush: false,
      });
      return quote.ok ? quote.lines[1].amountCents : Number.NaN;
    };
    expect(at(1100)).toBe(6); // 5.5 ¢
    expect(at(1099)).toBe(5); // 5.495 ¢
    expect(at(1300)).toBe(7); // 6.5 ¢
  });

  it('when tax or a discount lands on half a cent, then its magnitude rounds up', () => {
    const taxed = priceQuote({
      ruleSet: { ...flatRules, garmentBaseCents: { 'smocked-dress': { '4': 200 } }, taxRateBp: 825 },
      garment: dress,
      sizeCode: '4',
      quantity: 1,
      placements: [],
      isRush: false,
    });
    expect(taxed.ok && taxed.taxCents).toBe(17); // 16.5 ¢
    const discounted = priceQuote({
      ruleSet: { ...flatRules, centsPerThousandStitches: 10, quantityBreaks: [{ minQty: 1, discountBp: 500 }] },
      garment: dress,
      sizeCode: '4',
      quantity: 1,
      placements: [{ ...border, stitches: 1000 }],
      isRush: false,
    });
    expect(discounted.ok && discounted.lines.find((line) => line.code === 'quantity-discount')?.amountCents).toBe(-1); // 0.5 ¢
  });

  it('when the quantity reaches a higher break, then the larger discount applies', () => {
    const six = priceQuote({ ...order, quantity: 6, isRush: false });
    expect(six.ok && six.lines.find((line) => line.code === 'quantity-discount')?.label).toBe(
      'Quantity discount: 10 % off embroidery for 6 or more',
    );
  });

  it.each([
    ['an unknown size', { ...order, sizeCode: 'XXL' }, 'Price list 3 has no price for the Smocked dress in size XXL.'],
    [
      'an unknown size with its label, which a person reads instead of the code',
      { ...order, sizeCode: '0-3m', sizeLabel: '0–3 months' },
      'Price list 3 has no price for the Smocked dress in size 0–3 months.',
    ],
    [
      'an unknown garment',
      { ...order, garment: { slug: 'bishop-dress', name: 'Bishop dress' } },
      'Price list 3 has no price for the Bishop dress in size 4.',
    ],
    [
      'an inherited key as the garment',
      { ...order, garment: { slug: 'constructor', name: 'Constructor' } },
      /no price for the Constructor in size 4/,
    ],
    [
      'an inherited key as the size',
      { ...order, sizeCode: 'toString' },
      /no price for the Smocked dress in size toString/,
    ],
    ['no garment', { ...order, garment: undefined }, 'Choose a garment.'],
    [
      'garment prices not listed by size',
      { ...order, ruleSet: { ...ruleSet, garmentBaseCents: { bib: 800 } } },
      'The garment prices for bib must be listed by size code.',
    ],
    [
      'a fractional garment price',
      { ...order, ruleSet: { ...ruleSet, garmentBaseCents: { bib: { '4': 7.5 } } } },
      'The garment price for bib in size 4 must be whole cents, 0 or more.',
    ],
    ['a lower-case currency', { ...order, ruleSet: { ...ruleSet, currency: 'usd' } }, /ISO 4217/],
    ['a rush multiplier below 1', { ...order, ruleSet: { ...ruleSet, rushMultiplierBp: 9000 } }, /rush/],
    ['fractional cents', { ...order, ruleSet: { ...ruleSet, colorChangeCents: 2.5 } }, /colorChangeCents/],
    ['a zero quantity', { ...order, quantity: 0 }, /quantity/],
    ['a placement without hoopings', { ...order, placements: [{ ...border, hoopings: 0 }] }, /Placement 1/],
    ['an absurd quantity', { ...order, quantity: Number.MAX_SAFE_INTEGER }, /too large/],
  ])('when given %s, then it fails with a reason', (_, input, reason) => {
    const quote = priceQuote(input as QuoteInput);
    expect(quote.ok).toBe(false);
    expect(!quote.ok && quote.reason).toMatch(reason);
  });

  it('a rule set survives a JSON round trip unchanged and still validates', () => {
    const copy: PricingRuleSet = JSON.parse(JSON.stringify(ruleSet));
    expect(copy).toEqual(ruleSet);
    expect(checkPricingRuleSet(copy)).toEqual({ ok: true });
  });

  const cents = (max: number) => fc.integer({ min: 0, max });
  const arbitraryRules = fc.record({
    version: fc.integer({ min: 1, max: 99 }),
    currency: fc.constantFrom('USD', 'EUR', 'GBP', 'JPY'),
    garmentBaseCents: fc.record({
      dress: fc.record({ M: cents(10_000), L: cents(10_000) }),
      bib: fc.record({ M: cents(10_000) }),
    }),
    centsPerThousandStitches: cents(500),
    minimumPerPlacementCents: cents(2000),
    extraHoopingCents: cents(1000),
    colorChangeCents: cents(200),
    artworkSetupCents: cents(10_000),
    lettering: fc.record({ centsPerThousandStitches: cents(500), minimumCents: cents(2000) }),
    rushMultiplierBp: fc.integer({ min: 10_000, max: 30_000 }),
    quantityBreaks: fc.array(
      fc.record({ minQty: fc.integer({ min: 1, max: 50 }), discountBp: fc.integer({ min: 0, max: 10_000 }) }),
      { maxLength: 4 },
    ),
    taxRateBp: fc.integer({ min: 0, max: 2500 }),
  });
  const arbitraryPlacement = fc.record({
    id: fc.string(),
    label: fc.string(),
    kind: fc.constantFrom('stitching' as const, 'lettering' as const),
    stitches: fc.integer({ min: 0, max: 500_000 }),
    hoopings: fc.integer({ min: 1, max: 30 }),
    colorChanges: fc.integer({ min: 0, max: 40 }),
    hasCustomerArtwork: fc.boolean(),
  });
  const arbitraryOrder = fc.record({
    ruleSet: arbitraryRules,
    garment: fc.constantFrom({ slug: 'dress', name: 'Dress' }, { slug: 'bib', name: 'Bib' }),
    sizeCode: fc.constant('M'),
    quantity: fc.integer({ min: 1, max: 500 }),
    placements: fc.array(arbitraryPlacement, { minLength: 1, maxLength: 5 }),
    isRush: fc.boolean(),
  });

  it('property: the lines always add up to the subtotal and total, in whole cents', () => {
    fc.assert(
      fc.property(arbitraryOrder, (input) => {
        const quote = priceQuote(input);
        expect(quote.ok).toBe(true);
        if (!quote.ok) return;
        const sum = (lines: typeof quote.lines) => lines.reduce((total, line) => total + line.amountCents, 0);
        expect(sum(quote.lines)).toBe(quote.totalCents);
        expect(sum(quote.lines.filter((line) => line.code !== 'tax'))).toBe(quote.subtotalCents);
        expect(quote.subtotalCents + quote.taxCents).toBe(quote.totalCents);
        expect(quote.lines.every((line) => Number.isSafeInteger(line.amountCents))).toBe(true);
      }),
    );
  });

  it('property: the price never decreases as a placement gains stitches', () => {
    fc.assert(
      fc.property(arbitraryOrder, fc.nat({ max: 4 }), fc.integer({ min: 1, max: 100_000 }), (input, pick, extra) => {
        const index = pick % input.placements.length;
        const more = input.placements.map((placement, i) =>
          i === index ? { ...placement, stitches: placement.stitches + extra } : placement,
        );
        const before = priceQuote(input);
        const after = priceQuote({ ...input, placements: more });
        if (!before.ok || !after.ok) throw new Error('quote failed');
        expect(after.totalCents).toBeGreaterThanOrEqual(before.totalCents);
        expect(after.subtotalCents).toBeGreaterThanOrEqual(before.subtotalCents);
      }),
    );
  });
});
