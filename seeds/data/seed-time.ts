/**
 * Seeds never read the clock, so a second run writes the same rows. The demo's "today" is 28 November 2026;
 * times are UTC (the studio is in America/Chicago, six hours behind).
 */

/** A fixed instant from "YYYY-MM-DDTHH:MM", in UTC. */
export function at(isoMinute: string): Date {
  const date = new Date(`${isoMinute}:00.000Z`);
  if (Number.isNaN(date.getTime())) throw new Error(`Bad seed time: ${isoMinute}`);
  return date;
}

/** The instant `days` later. */
export function addDays(date: Date, days: number): Date {
  return new Date(date.getTime() + days * 86_400_000);
}

/** When the studio set up its catalogue: created_at and updated_at of every catalogue row. */
export const catalogueStamp = { created_at: at('2026-11-01T15:00'), updated_at: at('2026-11-01T15:00') };
