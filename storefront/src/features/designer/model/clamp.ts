import type { PlacementZoneSummary } from '@server/contracts/catalogue.ts';
import type { ExtentMm } from './design-setting.ts';

/** Positions are kept to 0.01 mm: finer than any machine stitches, and the documents stay readable. */
const round2 = (value: number) => Math.round(value * 100) / 100;

/** One axis: the centre keeps the whole item inside [start, start + length]; an item too big for it is centred. */
function clampAxis(centre: number, start: number, length: number, size: number): number {
  if (size >= length) return round2(start + length / 2);
  return round2(Math.min(Math.max(centre, start + size / 2), start + length - size / 2));
}

/** The nearest centre, mm on the mockup, at which an item of this extent lies wholly inside its zone. */
export function clampCentre(
  centre: { centerXMm: number; centerYMm: number },
  extent: ExtentMm,
  zone: PlacementZoneSummary,
) {
  return {
    centerXMm: clampAxis(centre.centerXMm, zone.xMm, zone.widthMm, extent.widthMm),
    centerYMm: clampAxis(centre.centerYMm, zone.yMm, zone.heightMm, extent.heightMm),
  };
}

/**
 * The nearest hem offset (the border's centre line above the hem edge, mm) at which a border band this tall stays
 * inside the hem zone, whose bottom edge is the hem.
 */
export function clampHemOffset(hemOffsetMm: number, bandHeightMm: number, zone: PlacementZoneSummary): number {
  return clampAxis(hemOffsetMm, 0, zone.heightMm, bandHeightMm);
}

export const fitsZone = (extent: ExtentMm, zone: PlacementZoneSummary) =>
  extent.widthMm <= zone.widthMm && extent.heightMm <= zone.heightMm;
