import type { SheetPlacement } from '../../contracts/production-sheet.ts';
import type { PlacementFigures } from '../quotes/placement-outcome.ts';
import { clearanceText, stitchingOrderText } from './production-sheet-wording.ts';

type BorderFigures = NonNullable<PlacementFigures['border']>;

/**
 * A border's hooping plan as the sheet prints it: the engine's hoopings in stitching order, each with its hoop
 * centre measured from the centre mark. The centre mark is the middle of the row of repeats (the mean of their
 * centres), which is the garment's centre front: the engine centres an open row on the front hem, and a loop's
 * two ends meet at the back. Negative is left of the mark as you face the front, positive right.
 */
export function sheetBorderPlan(
  border: BorderFigures,
  repeatHeightMm: number,
  hemOffsetMm: number,
): NonNullable<SheetPlacement['border']> {
  const { plan, count, pitchMm } = border;
  const first = plan.hoopings[0];
  const firstMidIndex = (first.repeatIndices[0] + first.repeatIndices[first.repeatIndices.length - 1]) / 2;
  const firstRepeatCentreMm = first.centerMm - firstMidIndex * pitchMm;
  const centreMarkMm = firstRepeatCentreMm + ((count - 1) * pitchMm) / 2;
  const hoopings = plan.hoopings.map((hooping) => ({
    order: hooping.order,
    repeatNumbers: hooping.repeatIndices.map((index) => index + 1),
    side: hooping.side,
    fromRowStartMm: hooping.centerMm,
    // Rounded away from float noise: 259.49999999 would print as 259.4.
    fromCentreMm: Number((hooping.centerMm - centreMarkMm).toFixed(6)),
  }));
  return {
    count,
    scalePct: border.scalePct,
    repeatWidthMm: border.repeatWidthMm,
    repeatHeightMm,
    pitchMm,
    runLengthMm: border.runLengthMm,
    isClosed: border.isClosed,
    hemOffsetMm,
    perHooping: plan.perHooping,
    isRotated: plan.rotated,
    hoopings,
    orderRule: stitchingOrderText(hoopings),
    clearanceNote: clearanceText(border.hoop),
  };
}
