import { toInchFraction } from '../../engine/inch-fraction.ts';

/**
 * A length in millimetres and in inches to the nearest sixteenth, in plain characters the PDF's embedded font
 * certainly has: "173 mm (6 13/16 in)". The sign is the caller's to say in words (left, below).
 */
export function formatLengthPlain(mm: number, decimals = 1): string {
  const { whole, numerator, denominator } = toInchFraction(mm);
  const inches =
    numerator === 0 ? `${whole}` : whole === 0 ? `${numerator}/${denominator}` : `${whole} ${numerator}/${denominator}`;
  return `${Number(Math.abs(mm).toFixed(decimals))} mm (${inches} in)`;
}
