import { describe, expect, it } from 'vitest';
import {
  colourChangesBetween,
  priceQuote,
  rehoopingWords,
  shippingOptions,
  shippingRefusal,
  type PricingRuleSet,
  type QuoteInput,
  type ShippingRates,
} from '../../../server/src/engine/index.ts';

// Worked arithmetic, not market rates (common practice, no source).
const rates: ShippingRates = {
  delivery: { isOffered: true, flatCents: 695, freeFromCents: 7500 },
  pickup: { isOffered: true, note: 'Weekdays 9 to 5 at the studio door' },
};

const ruleSet: PricingRuleSet = {
  version: 1,
  currency: 'USD',
  garmentBaseCents: { bib: { '1': 1000 } },
  centsPerThousandStitches: 120,
  minimumPerPlacementCents: 500,
  extraHoopingCents: 150,
  colorChangeCents: 25,
  artworkSetupCents: 0,
  lettering: { centsPerThousandStitches: 150, minimumCents: 600 },
  rushMultiplierBp: 10_000,
  quantityBreaks: [],
  taxRateBp: 1000,
};

/** A bib with one placement of `stitches` stitches: 1,000 ¢ garment + stitches × 120 / 1,000 ¢, no other charge. */
const bibQuote = (stitches: number, method: 'delivery' | 'pickup' = 'delivery'): QuoteInput => ({
  ruleSet,
  garment: { slug: 'bib', name: 'Bib' },
  sizeCode: '1',
  quantity: 1,
  isRush: false,
  placements: [
    { id: 'p', label: 'Motif', kind: 'stitching', stitches, hoopings: 1, colorChanges: 0, hasCustomerArtwork: false },
  ],
  shipping: { rates, method },
});

describe('shippingOptions', () => {
  it('when the goods come to just under the free-delivery amount, then delivery costs the flat rate', () => {
    const priced = shippingOptions(rates, 7499);
    expect(priced.ok && priced.options).toEqual([
      { method: 'delivery', name: 'Delivery to your address', cents: 695 },
      { method: 'pickup', name: 'Pick up at the studio', cents: 0 },
    ]);
  });

  it('when the goods come to exactly the free-delivery amount, then delivery is free', () => {
    const priced = shippingOptions(rates, 7500);
    expect(priced.ok && priced.options[0].cents).toBe(0);
  });

  it('when the goods come to more than the free-delivery amount, then delivery is free', () => {
    const priced = shippingOptions(rates, 12_000);
    expect(priced.ok && priced.options[0].cents).toBe(0);
  });

  it('when delivery is never free, then even a large order pays the flat rate', () => {
    const priced = shippingOptions({ ...rates, delivery: { ...rates.delivery, freeFromCents: null } }, 1_000_000);
    expect(priced.ok && priced.options[0].cents).toBe(695);
  });

  it('when the shop offers only pick-up, then delivery is refused with a sentence naming pick-up', () => {
    const pickupOnly = { ...rates, delivery: { ...rates.delivery, isOffered: false } };
    const priced = shippingOptions(pickupOnly, 100);
    expect(priced.ok && priced.options.map((option) => option.method)).toEqual(['pickup']);
    expect(shippingRefusal(pickupOnly, 'delivery')).toBe(
      'The studio no longer offers delivery to your address; choose pick-up at the studio instead.',
    );
    expect(shippingRefusal(pickupOnly, 'pickup')).toBeUndefined();
  });

  it('when the shop offers neither way, then the rates are refused', () => {
    const none = { delivery: { ...rates.delivery, isOffered: false }, pickup: { ...rates.pickup, isOffered: false } };
    expect(shippingOptions(none, 100).ok).toBe(false);
  });
});

describe('priceQuote with shipping', () => {
  it('when a quote is under the free-delivery amount, then shipping is its own untaxed line and the totals sum', () => {
    // 1,000 + 50,000 × 120 / 1,000 = 7,000 ¢ of goods, under 7,500: delivery 695; tax 10 % of 7,000 only.
    const quote = priceQuote(bibQuote(50_000));
    expect(quote.ok).toBe(true);
    if (!quote.ok) return;
    expect(quote.lines.map(({ code, amountCents }) => [code, amountCents])).toEqual([
      ['garment', 1000],
      ['stitching', 6000],
      ['shipping', 695],
      ['tax', 700],
    ]);
    expect(quote).toMatchObject({ subtotalCents: 7000, shippingCents: 695, taxCents: 700, totalCents: 8395 });
    expect(quote.shipping?.method).toBe('delivery');
  });

  it('when a quote comes to exactly the free-delivery amount, then its delivery line is free and says so', () => {
    // 1,000 + 54,167 × 120 / 1,000 = 7,500.04 → 7,500 ¢: at the amount, delivery is free.
    const quote = priceQuote(bibQuote(54_167));
    expect(quote.ok && quote.subtotalCents).toBe(7500);
    expect(quote.ok && quote.lines.find((line) => line.code === 'shipping')).toEqual({
      code: 'shipping',
      label: 'Delivery to your address: free for this order',
      amountCents: 0,
    });
    expect(quote.ok && quote.totalCents).toBe(8250);
  });

  it('when a quote is above the free-delivery amount, then delivery adds nothing to the total', () => {
    const quote = priceQuote(bibQuote(80_000));
    expect(quote.ok && quote.shippingCents).toBe(0);
    expect(quote.ok && quote.totalCents).toBe(quote.ok && quote.subtotalCents + quote.taxCents);
  });

  it('when the customer picks up, then the line costs nothing', () => {
    const quote = priceQuote(bibQuote(50_000, 'pickup'));
    expect(quote.ok && quote.lines.find((line) => line.code === 'shipping')?.label).toBe('Pick up at the studio');
    expect(quote.ok && quote.shippingCents).toBe(0);
  });

  it('when lines are priced per unit, then each carries its unit rate beside its count', () => {
    const input = bibQuote(50_000);
    const quote = priceQuote({
      ...input,
      placements: [{ ...input.placements[0], hoopings: 3, colorChanges: 2 }],
    });
    if (!quote.ok) throw new Error(quote.reason);
    const rateOf = (code: string) => quote.lines.find((line) => line.code === code)?.rate;
    expect(rateOf('garment')).toEqual({ cents: 1000, per: 'garment' });
    expect(rateOf('stitching')).toEqual({ cents: 120, per: '1,000 stitches', minimumCents: 500 });
    expect(rateOf('extra-hoopings')).toEqual({ cents: 150, per: 'extra hooping' });
    expect(rateOf('color-changes')).toEqual({ cents: 25, per: 'colour change' });
  });
});

describe('the quote’s hooping words', () => {
  it('when 4 placements take 8 hoopings, then the line says 4 extra of the 8 in all', () => {
    expect(rehoopingWords(8, 4)).toBe(
      '4 extra hoopings of 8 hoopings in all (the first of each of the 4 placements is included)',
    );
    expect(rehoopingWords(5, 1)).toBe('4 extra hoopings of 5 hoopings in all (the first is included)');
  });
});

describe('colourChangesBetween', () => {
  it('when each placement starts on another thread than the last ended on, then each adds one change', () => {
    expect(colourChangesBetween([['white', 'pink'], ['green'], ['green', 'blue'], ['white']])).toEqual([0, 1, 0, 1]);
  });

  it('when a placement’s threads are not known yet, then nothing is counted into or out of it', () => {
    expect(colourChangesBetween([['white'], undefined, ['pink']])).toEqual([0, 0, 0]);
  });
});
