import type { StabilizerKind } from '../../engine/index.ts';
import { usableField } from '../../engine/hoop-fit.ts';

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

/**
 * The stitching order of a border's hoopings in words, the rule `planHoopings` follows: outwards from the centre
 * mark, each new hooping beside sewn work. `hoopings` are in stitching order with their hoop centre's distance from
 * the centre mark (negative: left). Both the studio page and the PDF print this sentence.
 */
export function stitchingOrderText(hoopings: readonly { order: number; fromCentreMm: number }[]): string {
  if (hoopings.length <= 1) return 'One hooping: its centre goes on the centre mark.';
  const leftToRight = [...hoopings].sort((a, b) => a.fromCentreMm - b.fromCentreMm).map((h) => h.order);
  return (
    'Stitch hooping 1 first: the one holding the centre mark or, when the mark falls between two hoopings, the left ' +
    'of them. Then work outwards, each time the unsewn hooping nearest the centre mark (the left one first when two ' +
    'are equally near, as you face the front), so each new hooping lies beside stitches already sewn. From left to ' +
    `right the hoopings are numbered ${leftToRight.join(', ')}.`
  );
}

/** The hoop's clearance as the sheet states it: what stays free inside the sewing field, and what that leaves. */
export function clearanceText(hoop: { fieldWidthMm: number; fieldHeightMm: number; clearanceMm: number }): string {
  if (hoop.clearanceMm <= 0) return 'Planned to the edge of the sewing field (no clearance set for this hoop).';
  const usable = usableField(hoop);
  const mm = (value: number) => `${Number(value.toFixed(1))}`;
  return (
    `Planned with ${mm(hoop.clearanceMm)} mm kept clear inside the sewing field at every edge ` +
    `(${mm(usable.widthMm)} × ${mm(usable.heightMm)} mm of the ${mm(hoop.fieldWidthMm)} × ${mm(hoop.fieldHeightMm)} mm field).`
  );
}

/** "1 h 12 min", "38 min": machine time for people. */
export function minutesText(minutes: number): string {
  const rounded = Math.round(minutes);
  const hours = Math.floor(rounded / 60);
  return hours === 0 ? `${rounded} min` : `${hours} h ${rounded % 60} min`;
}
