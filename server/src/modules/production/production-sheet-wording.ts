import type { StabilizerKind } from '../../engine/index.ts';

/** The backings in the trade's words, as a supplier's bolt would be labelled. */
export const BACKING_NAMES: Readonly<Record<StabilizerKind, string>> = {
  'water-soluble-adhesive': 'water-soluble (adhesive, wash-away)',
  tearaway: 'tearaway',
  'cutaway-adhesive': 'cutaway (fusible)',
  cutaway: 'cutaway',
  'no-show-mesh': 'no-show mesh cutaway',
};

export const toppingName = (topping: 'water-soluble' | null) =>
  topping === 'water-soluble' ? 'water-soluble film on top' : 'none needed';

/** Where a hoop centre goes, from its signed distance to the centre mark and that distance already formatted. */
export function hoopingWhere(fromCentreMm: number, distance: string): string {
  if (Math.abs(fromCentreMm) < 0.05) return 'on the centre mark';
  return `${distance} ${fromCentreMm < 0 ? 'left' : 'right'} of the centre mark`;
}

/** "1 h 12 min", "38 min": machine time for people. */
export function minutesText(minutes: number): string {
  const rounded = Math.round(minutes);
  const hours = Math.floor(rounded / 60);
  return hours === 0 ? `${rounded} min` : `${hours} h ${rounded % 60} min`;
}
