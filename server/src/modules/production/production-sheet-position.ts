/**
 * Where a single item (a motif, lettering, the customer's artwork) goes on the garment, as the operator measures
 * it with a ruler on the flat garment, front up: across from the centre-front line and up or down from the nearest
 * landmark on that line (the neckline, the hem edge, a brim's edge). Pure: mm in, mm and words out.
 */
import type { SheetPlacement } from '../../contracts/production-sheet.ts';
import { formatLengthPlain } from './format-length-plain.ts';
import type { GarmentLandmark } from './production-sheet-repo.ts';

/** Closer than this to a line counts as on it, mm: half a millimetre is below what a chalk line shows. */
const ON_THE_LINE_MM = 0.5;
/** With no landmark stated, the top of the front drawing is the garment's top edge. */
const TOP_EDGE: GarmentLandmark = { label: 'garment’s top edge', yMm: 0 };

export interface ItemWhere {
  centerXMm: number;
  centerYMm: number;
  rotationDeg: number;
}

/**
 * The landmarks of the garment at its size: the stated ones, and the hem edge at the centre front (the hem zone's
 * bottom, which is the middle of a curved hem too) when the garment has a hem zone.
 */
export function landmarksOf(
  stated: readonly GarmentLandmark[],
  hemZone: { yMm: number; heightMm: number } | undefined,
): GarmentLandmark[] {
  const hem = hemZone ? [{ label: 'hem edge', yMm: hemZone.yMm + hemZone.heightMm }] : [];
  const all = [...stated, ...hem];
  return all.length > 0 ? all : [TOP_EDGE];
}

export function placementPositionOf(
  item: ItemWhere,
  mockupWidthMm: number,
  landmarks: readonly GarmentLandmark[],
): NonNullable<SheetPlacement['position']> {
  const fromCentreFrontMm = round(item.centerXMm - mockupWidthMm / 2);
  const nearest = [...landmarks].sort(
    (a, b) => Math.abs(item.centerYMm - a.yMm) - Math.abs(item.centerYMm - b.yMm),
  )[0]!;
  const belowLandmarkMm = round(item.centerYMm - nearest.yMm);
  const across =
    Math.abs(fromCentreFrontMm) < ON_THE_LINE_MM
      ? 'on the centre front'
      : `${formatLengthPlain(fromCentreFrontMm)} ${fromCentreFrontMm < 0 ? 'left' : 'right'} of the centre front (as you face it)`;
  const down =
    Math.abs(belowLandmarkMm) < ON_THE_LINE_MM
      ? `level with the ${nearest.label}`
      : `${formatLengthPlain(belowLandmarkMm)} ${belowLandmarkMm > 0 ? 'below' : 'above'} the ${nearest.label}`;
  const turn =
    item.rotationDeg === 0
      ? ''
      : `, turned ${Math.abs(item.rotationDeg)}° ${item.rotationDeg > 0 ? 'clockwise' : 'anticlockwise'}`;
  return {
    fromCentreFrontMm,
    landmark: nearest.label,
    belowLandmarkMm,
    rotationDeg: item.rotationDeg,
    words: `Design centre ${across}, ${down}${turn}.`,
  };
}

const round = (mm: number) => Number(mm.toFixed(2));
