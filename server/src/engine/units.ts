/**
 * Length units. Inside the engine every length is millimetres; these convert what files and people use.
 */

/** 1 in = 25.4 mm exactly: International Yard and Pound Agreement (1959); NIST SP 811 (2008) App. B. */
export const MM_PER_INCH = 25.4;

/** Square millimetres in one square centimetre. */
export const MM2_PER_CM2 = 100;

/** One CSS pixel, the SVG user unit when nothing else sets the size: 1/96 in (W3C CSS Values and Units Level 3). */
export const MM_PER_CSS_PX = MM_PER_INCH / 96;

/**
 * Absolute CSS/SVG length units in millimetres. Source: W3C CSS Values and Units Module Level 3, "Absolute
 * lengths" (1in = 2.54cm = 96px, 1pt = 1/72 in, 1pc = 1/6 in, 1Q = 1/40 cm). An SVG number without a unit is px.
 */
const MM_PER_CSS_UNIT: Readonly<Record<string, number>> = {
  '': MM_PER_CSS_PX,
  px: MM_PER_CSS_PX,
  mm: 1,
  cm: 10,
  q: 0.25,
  in: MM_PER_INCH,
  pt: MM_PER_INCH / 72,
  pc: MM_PER_INCH / 6,
};

/**
 * Reads an SVG length attribute such as "120mm", "4.5in" or "300" as millimetres. Relative units (%, em)
 * have no size outside a browser, so they give `undefined`, as does anything that is not a positive length.
 */
export function parseSvgLengthMm(value: string | undefined): number | undefined {
  if (value === undefined) return undefined;
  const match = /^\s*([+]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?)\s*([a-z%]*)\s*$/i.exec(value);
  if (!match) return undefined;
  const unit = match[2].toLowerCase();
  if (!Object.hasOwn(MM_PER_CSS_UNIT, unit)) return undefined;
  const length = Number(match[1]) * MM_PER_CSS_UNIT[unit];
  return Number.isFinite(length) && length > 0 ? length : undefined;
}
