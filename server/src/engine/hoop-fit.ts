/** A hoop's sewing field, mm, as it lies on the machine. */
export interface SewingField {
  fieldWidthMm: number;
  fieldHeightMm: number;
  /**
   * Kept free between the stitching and every edge of the field, mm (the hoop's own setting; default 0), so the
   * foot never meets the frame and the fabric stays taut under the last stitches.
   */
  clearanceMm?: number;
}

/** An item's upright size, mm. */
export interface ItemExtentMm {
  widthMm: number;
  heightMm: number;
}

/** Slack for "does it fit" comparisons, mm, so a size equal to the usable field is not rejected by rounding. */
const FIT_SLACK_MM = 1e-9;

/** The part of the field the stitching may use: the field less the clearance at each edge, mm (never below 0). */
export function usableField(field: SewingField): { widthMm: number; heightMm: number } {
  const clearanceMm = field.clearanceMm ?? 0;
  return {
    widthMm: Math.max(0, field.fieldWidthMm - 2 * clearanceMm),
    heightMm: Math.max(0, field.fieldHeightMm - 2 * clearanceMm),
  };
}

/**
 * How a single item goes in a hoop: as drawn, turned a quarter (when it only fits the other way round), or not at
 * all, inside the usable field (the clearance kept at every edge). The one rule behind the quote's hoop choice, the
 * designer's size limit and the sheet's template.
 */
export function fitInField(field: SewingField, item: ItemExtentMm): 'as-drawn' | 'turned' | undefined {
  const usable = usableField(field);
  const fits = (width: number, height: number) =>
    item.widthMm <= width + FIT_SLACK_MM && item.heightMm <= height + FIT_SLACK_MM;
  if (fits(usable.widthMm, usable.heightMm)) return 'as-drawn';
  if (fits(usable.heightMm, usable.widthMm)) return 'turned';
  return undefined;
}

/** The largest factor this item may be scaled by and still go in the usable field, either way round. */
export function largestScaleInField(field: SewingField, item: ItemExtentMm): number {
  const usable = usableField(field);
  return Math.max(
    Math.min(usable.widthMm / item.widthMm, usable.heightMm / item.heightMm),
    Math.min(usable.heightMm / item.widthMm, usable.widthMm / item.heightMm),
  );
}
