import {
  converter,
  differenceCiede2000,
  formatHex,
  modeHsl,
  modeLab65,
  modeRgb,
  parse as parseColor,
  useMode,
} from 'culori/fn';
import { isFiniteNumber, isRecord } from './input-checks.ts';

// culori's tree-shakeable build: only the colour spaces used here are registered, which keeps about 35 kB of
// other spaces out of the apps' bundles. Registering is idempotent; the full 'culori' entry does the same for all.
useMode(modeRgb);
useMode(modeHsl);
useMode(modeLab65);

/** A CIELAB colour under the D65 white point (L 0–100). */
export interface LabColor {
  l: number;
  a: number;
  b: number;
}

/** culori's CIEDE2000 with the parametric factors kL = kC = kH = 1, the reference conditions. */
const ciede2000 = differenceCiede2000();
const toLab65 = converter('lab65');

/**
 * CIEDE2000 colour difference ΔE00 between two Lab colours (Sharma, Wu & Dalal, Color Res. Appl. 30(1), 2005).
 * The values are passed to culori as `lab65` on purpose: culori converts whatever it gets to lab65 first, so
 * handing it D50 `lab` would shift results by up to 0.6 (trade-facts, "Library gotcha"). `NaN` for non-numbers.
 */
export function colorDifferenceCiede2000(first: LabColor, second: LabColor): number {
  if (!isLab(first) || !isLab(second)) return Number.NaN;
  return ciede2000(
    { mode: 'lab65', l: first.l, a: first.a, b: first.b },
    { mode: 'lab65', l: second.l, a: second.a, b: second.b },
  );
}

/** A `#rgb` or `#rrggbb` sRGB colour in D65 Lab, or `undefined` when the text is not such a hex colour. */
export function hexToLab(hex: string): LabColor | undefined {
  if (typeof hex !== 'string' || !/^#(?:[0-9a-f]{3}|[0-9a-f]{6})$/i.test(hex.trim())) return undefined;
  const parsed = parseColor(hex.trim());
  if (!parsed) return undefined;
  const { l, a, b } = toLab65(parsed);
  return { l, a, b };
}

/** A CSS colour (hex, rgb(), hsl(), a name) as `#rrggbb`; null when fully transparent; undefined when unreadable. */
export function cssColorToHex(text: string): string | null | undefined {
  let parsed: ReturnType<typeof parseColor>;
  try {
    parsed = parseColor(text);
  } catch {
    // culori 4.0.2's tokenizer throws a TypeError on some junk (fill="/0A", found by the property tests).
    return undefined;
  }
  if (!parsed) return undefined;
  return parsed.alpha === 0 ? null : formatHex(parsed);
}

function isLab(value: unknown): value is LabColor {
  return isRecord(value) && isFiniteNumber(value.l) && isFiniteNumber(value.a) && isFiniteNumber(value.b);
}
