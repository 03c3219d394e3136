/** A hoop's sewing field, mm, as it lies on the machine. */
export interface SewingField {
  fieldWidthMm: number;
  fieldHeightMm: number;
}

/** An item's upright size, mm. */
export interface ItemExtentMm {
  widthMm: number;
  heightMm: number;
}

/**
 * How a single item goes in a hoop: as drawn, turned a quarter (when it only fits the other way round), or not at
 * all. The one rule behind the quote's hoop choice, the designer's size limit and the sheet's template.
 */
export function fitInField(field: SewingField, item: ItemExtentMm): 'as-drawn' | 'turned' | undefined {
  if (item.widthMm <= field.fieldWidthMm && item.heightMm <= field.fieldHeightMm) return 'as-drawn';
  if (item.widthMm <= field.fieldHeightMm && item.heightMm <= field.fieldWidthMm) return 'turned';
  return undefined;
}

/** The largest factor this item may be scaled by and still go in the field, either way round. */
export function largestScaleInField(field: SewingField, item: ItemExtentMm): number {
  return Math.max(
    Math.min(field.fieldWidthMm / item.widthMm, field.fieldHeightMm / item.heightMm),
    Math.min(field.fieldHeightMm / item.widthMm, field.fieldWidthMm / item.heightMm),
  );
}
