import type { ThreadColourSummary } from '@server/contracts/catalogue.ts';
// Straight from its module, as border-layout does with fitBorder: the engine's entry point is not needed here.
import { nearestThreads } from '@server/engine/nearest-threads.ts';

/** How many of the nearest threads to offer for a colour of the customer's own. */
const OFFERED_MATCHES = 3;

/**
 * What a CIEDE2000 difference means to someone looking at thread on fabric. The bands are common practice, no
 * source: under 1 is taken as not visible, 1–2 as seen only on close inspection, 2–5 as visible side by side, and
 * above 5 as clearly a different colour.
 */
export function describeDeltaE(deltaE: number): string {
  if (deltaE < 1) return 'no visible difference';
  if (deltaE < 2) return 'only seen up close';
  if (deltaE <= 5) return 'a slight difference side by side';
  return 'clearly a different colour';
}

export interface OfferedThread {
  thread: ThreadColourSummary;
  /** CIEDE2000 from the colour asked for, to one decimal. */
  deltaE: number;
  words: string;
}

/** The palette's threads nearest a colour the customer picked, nearest first, with the difference in words. */
export function offerNearestThreads(hex: string, palette: readonly ThreadColourSummary[]): OfferedThread[] {
  const found = nearestThreads(hex, palette, OFFERED_MATCHES);
  if (!found.ok) return [];
  return found.matches.map(({ thread, deltaE }) => ({
    thread,
    deltaE: Math.round(deltaE * 10) / 10,
    words: describeDeltaE(deltaE),
  }));
}
