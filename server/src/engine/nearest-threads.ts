import { colorDifferenceCiede2000, hexToLab } from './color-difference.ts';
import { fail, type EngineResult } from './engine-result.ts';
import { isRecord, isWholeNumber } from './input-checks.ts';

/** A thread in a shop's palette. Extra fields (stock, brand line) are carried through untouched. */
export interface ThreadColor {
  code: string;
  name: string;
  /** `#rrggbb` sRGB. */
  hex: string;
}

export interface ThreadMatch<T extends ThreadColor = ThreadColor> {
  thread: T;
  /** CIEDE2000 difference from the requested colour: under about 1 is hard to tell apart. */
  deltaE: number;
}

/**
 * The `k` threads closest to a colour by CIEDE2000, nearest first (palette order breaks ties).
 * `hex` is `#rgb` or `#rrggbb`; a palette entry with an unreadable colour fails the lookup, naming the thread.
 */
export function nearestThreads<T extends ThreadColor>(
  hex: string,
  palette: readonly T[],
  k: number,
): EngineResult<{ matches: ThreadMatch<T>[] }> {
  const target = hexToLab(hex);
  if (!target) return fail('The colour must be written as #rrggbb (for example #f4a6c0).');
  if (!Array.isArray(palette) || palette.length === 0) return fail('The thread palette is empty.');
  if (!isWholeNumber(k, 1)) return fail('Ask for at least one thread.');
  const matches: ThreadMatch<T>[] = [];
  for (const thread of palette) {
    const lab = isRecord(thread) && typeof thread.hex === 'string' ? hexToLab(thread.hex) : undefined;
    if (!lab)
      return fail(
        `Thread ${isRecord(thread) && typeof thread.code === 'string' ? thread.code : '(no code)'} has no readable #rrggbb colour.`,
      );
    matches.push({ thread, deltaE: colorDifferenceCiede2000(target, lab) });
  }
  // Array.prototype.sort is stable (ES2019), so equal differences keep palette order.
  matches.sort((x, y) => x.deltaE - y.deltaE);
  return { ok: true, matches: matches.slice(0, k) };
}
