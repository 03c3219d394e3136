/**
 * Money arithmetic on integer minor units (cents). Products of counts and rates can pass 2^53, so the exact
 * work is done in BigInt and only the rounded cents come back as numbers.
 */

/**
 * numerator ÷ denominator rounded half-up, for a non-negative numerator and a positive denominator: 12.5 → 13,
 * 12.49 → 12. Negative amounts (discounts) are rounded as magnitudes by the caller, so halves go away from zero.
 */
export function divideRoundHalfUp(numerator: bigint, denominator: bigint): bigint {
  return (2n * numerator + denominator) / (2n * denominator);
}

/** The value as a number when it is a safe integer, else `undefined` (the amount is too large to hold exactly). */
export function toSafeCents(value: bigint): number | undefined {
  return value <= BigInt(Number.MAX_SAFE_INTEGER) && value >= -BigInt(Number.MAX_SAFE_INTEGER)
    ? Number(value)
    : undefined;
}

/** Basis points in one whole: 10,000 bp = 100 %. */
export const BASIS_POINTS = 10_000n;
