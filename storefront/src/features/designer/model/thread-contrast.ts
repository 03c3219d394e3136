import type { ThreadColourSummary } from '@server/contracts/catalogue.ts';

/** WCAG's contrast for large text; a name stitched below it fades into the fabric. */
const LEGIBLE_CONTRAST = 3;

/** Relative luminance of an sRGB colour written as #rrggbb (WCAG 2.1). */
function luminance(hex: string): number {
  const channels = [1, 3, 5].map((start) => Number.parseInt(hex.slice(start, start + 2), 16) / 255);
  const [r, g, b] = channels.map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
}

const contrast = (a: string, b: string) => {
  const [light, dark] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (light! + 0.05) / (dark! + 0.05);
};

/** The first thread in the palette's order that reads clearly on this fabric, so a new name never starts invisible. */
export function legibleThread(
  threads: readonly ThreadColourSummary[],
  fabricHex: string,
): ThreadColourSummary | undefined {
  return threads.find((thread) => contrast(thread.hex, fabricHex) >= LEGIBLE_CONTRAST) ?? threads.at(-1);
}
