/** Numbers inside sentences the apps show (reasons, line labels), always in en-US form so server and browser agree. */

/** Rounds for sentences: at most `decimals` places, no trailing zeros ("96.1", "90", "0.25"). */
export function formatNumber(value: number, decimals = 1): string {
  return String(Number(value.toFixed(decimals)));
}

/** A scale factor as a percentage for sentences: 0.9611 → "96.1 %". */
export function formatPercent(scale: number): string {
  return `${formatNumber(scale * 100)} %`;
}

/** A count with its noun: "1 hooping", "3 hoopings", "12,345 stitches". */
/** Made once: toLocaleString builds a new formatter on every call, which showed in the quote's profile. */
const countFormat = new Intl.NumberFormat('en-US');

export function formatCount(count: number, singular: string, plural = `${singular}s`): string {
  return `${countFormat.format(count)} ${count === 1 ? singular : plural}`;
}
