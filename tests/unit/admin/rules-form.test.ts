import { describe, expect, it } from 'vitest';
import { pricingRules } from '../../../server/src/contracts/admin-pricing.ts';
import {
  fromRulesForm,
  garmentLabel,
  isComplete,
  toRulesForm,
} from '../../../admin/src/features/pricing/model/rules-form.ts';
import { pricingRuleSets } from '../../../seeds/data/pricing.ts';

const { version: _version, ...seededRules } = pricingRuleSets[1]!.rules;

describe('the price list form', () => {
  it('when the seeded draft goes into the form and back, then every rule comes back to the cent and still passes the contract', () => {
    const back = fromRulesForm(toRulesForm(seededRules));
    expect(back).toEqual(seededRules);
    expect(pricingRules.safeParse(back).success).toBe(true);
  });

  it('when amounts are shown, then money is in dollars and rates in percent: 130 ¢ = "1.30", × 1.5 = "50" %, 700 bp = "7" %', () => {
    const form = toRulesForm(seededRules);
    expect(form.centsPerThousandStitches).toBe('1.30');
    expect(form.rushMultiplierBp).toBe('50');
    expect(form.taxRateBp).toBe('7');
    expect(form.quantityBreaks[0]).toEqual({ minQty: '2', discountBp: '3' });
    expect(form.garmentBaseCents['bishop-dress']!['6m']).toBe('38.00');
  });

  it('when typed values have fractions of a cent or percent, then they round to whole cents and basis points', () => {
    const form = { ...toRulesForm(seededRules), extraHoopingCents: '3.555', taxRateBp: '8.25', rushMultiplierBp: '25' };
    const rules = fromRulesForm(form);
    expect(rules.extraHoopingCents).toBe(356);
    expect(rules.taxRateBp).toBe(825);
    expect(rules.rushMultiplierBp).toBe(12_500);
  });

  it('when a field is left empty, then the rules are incomplete, so no preview is asked for', () => {
    expect(isComplete(fromRulesForm({ ...toRulesForm(seededRules), colorChangeCents: '' }))).toBe(false);
    expect(isComplete(fromRulesForm(toRulesForm(seededRules)))).toBe(true);
  });

  it('when a garment slug is shown, then it reads as words', () => {
    expect(garmentLabel('smocked-yoke-dress')).toBe('Smocked yoke dress');
  });
});
