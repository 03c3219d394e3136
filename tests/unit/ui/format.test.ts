import { describe, expect, it } from 'vitest';
import { formatLength, formatMoney } from '../../../ui/src/format.ts';

describe('formatLength', () => {
  it('when a border repeat is 173 mm, then it reads 173 mm · 6 ¹³⁄₁₆ in (the product brief’s own example)', () => {
    // 1 in = 25.4 mm exactly (International Yard and Pound Agreement, 1959; NIST SP 811 App. B).
    expect(formatLength(173)).toBe('173 mm · 6 ¹³⁄₁₆ in');
  });

  it('when the length is a whole number of inches, then no fraction is shown', () => {
    expect(formatLength(25.4 * 4)).toBe('102 mm · 4 in');
  });

  it('when the hem centre line is 1¾ in above the edge, then 44.45 mm reads 1 ³⁄₄ in (common practice, no source)', () => {
    expect(formatLength(44.45)).toBe('44 mm · 1 ³⁄₄ in');
  });

  it('when the length is under an inch, then only the fraction is shown', () => {
    expect(formatLength(12.7)).toBe('13 mm · ¹⁄₂ in');
  });
});

describe('formatMoney', () => {
  it('when the currency has two decimals, then cents are divided by 100', () => {
    // Minor units per ISO 4217 List One: USD 2, JPY 0 (as shipped in npm currency-codes 2.2.0; trade-facts).
    expect(formatMoney(12345, 'USD')).toBe('$123.45');
  });

  it('when the currency has no minor unit, then the amount is shown as is', () => {
    expect(formatMoney(500, 'JPY')).toBe('¥500');
  });
});
