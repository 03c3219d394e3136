/**
 * The 1:1 placement templates' geometry, in millimetres from each template's top-left corner. Pure: the PDF and
 * the studio page both draw from these figures, so the printout and the screen cannot disagree.
 */
import type { PlacementTemplate, SheetPlacement } from '../../contracts/production-sheet.ts';
import { fitInField, usableField } from '../../engine/hoop-fit.ts';
import { placeOutlines, type ArtworkOutline } from './production-sheet-outlines.ts';
import { clearanceText } from './production-sheet-wording.ts';

/** Clear paper round the sewing field, mm, so the field's outline is not lost at a trimmed edge. */
const PADDING_MM = 4;

type Border = NonNullable<SheetPlacement['border']>;
type Hoop = NonNullable<SheetPlacement['hoop']>;

const mm1 = (value: number) => `${Number(value.toFixed(1))} mm`;

/**
 * Templates for a border: one per distinct number of repeats in a hooping (usually all hoopings hold the same,
 * so one template serves them all). The row runs across the template, along the field's side the engine chose.
 */
export function borderTemplates(
  placement: SheetPlacement,
  border: Border,
  hoop: Hoop,
  artwork: ArtworkOutline,
): PlacementTemplate[] {
  const bySize = new Map<number, number[]>();
  for (const hooping of border.hoopings)
    bySize.set(hooping.repeatNumbers.length, [...(bySize.get(hooping.repeatNumbers.length) ?? []), hooping.order]);
  const [rowMm, acrossMm] = fieldAlongRow(hoop, border.repeatHeightMm);

  return [...bySize].map(([repeats, orders]): PlacementTemplate => {
    const field = { xMm: PADDING_MM, yMm: PADDING_MM, widthMm: rowMm, heightMm: acrossMm };
    const centre = { xMm: field.xMm + rowMm / 2, yMm: field.yMm + acrossMm / 2 };
    const groupWidthMm = (repeats - 1) * border.pitchMm + border.repeatWidthMm;
    const box = {
      xMm: centre.xMm - groupWidthMm / 2,
      yMm: centre.yMm - border.repeatHeightMm / 2,
      widthMm: groupWidthMm,
      heightMm: border.repeatHeightMm,
    };
    const starts = Array.from({ length: repeats }, (_, k) => box.xMm + k * border.pitchMm);
    const joins = new Set(
      starts.flatMap((start) => [start, start + border.repeatWidthMm]).map((x) => Number(x.toFixed(3))),
    );
    const hemLineYMm = centre.yMm + border.hemOffsetMm;
    const hoopings = orders.length === 1 ? `hooping ${orders[0]}` : `hoopings ${orders.join(', ')}`;
    return {
      id: `${placement.id}-${repeats}`,
      placementId: placement.id,
      title: `${placement.label} · ${repeats === 1 ? 'one repeat' : `${repeats} repeats`} per hooping`,
      subtitle: `${mm1(border.repeatWidthMm)} repeat at ${border.scalePct} % in the ${hoop.name}; use for ${hoopings}. ${clearanceText(hoop)}`,
      widthMm: rowMm + 2 * PADDING_MM,
      heightMm: Math.max(field.yMm + acrossMm, hemLineYMm) + PADDING_MM,
      field,
      centre,
      guideLineYMm: centre.yMm,
      hemLineYMm,
      joinMarksXMm: [...joins].sort((a, b) => a - b),
      artwork: box,
      outlines: starts.flatMap((start) => placeOutlines(artwork.outlines, start, box.yMm)),
      pictureDataUrl: null,
    };
  });
}

/**
 * A border hooping's sewing field as [along the row, across it], mm, as planHoopings orients the row: along the
 * long side when the motif's height fits across the short one of the usable field (less the clearance at each edge).
 */
export function fieldAlongRow(hoop: Hoop, repeatHeightMm: number): [number, number] {
  const longMm = Math.max(hoop.fieldWidthMm, hoop.fieldHeightMm);
  const shortMm = Math.min(hoop.fieldWidthMm, hoop.fieldHeightMm);
  const usable = usableField(hoop);
  return repeatHeightMm <= Math.min(usable.widthMm, usable.heightMm) + 1e-9 ? [longMm, shortMm] : [shortMm, longMm];
}

/** A single motif, lettering or the customer's artwork centred in its hoop's field, turned to fit when it only fits the other way. */
export function itemTemplate(placement: SheetPlacement, hoop: Hoop, artwork: ArtworkOutline): PlacementTemplate {
  const fitsAsIs = fitInField(hoop, artwork) !== 'turned';
  const [fieldWidthMm, fieldHeightMm] = fitsAsIs
    ? [hoop.fieldWidthMm, hoop.fieldHeightMm]
    : [hoop.fieldHeightMm, hoop.fieldWidthMm];
  const field = { xMm: PADDING_MM, yMm: PADDING_MM, widthMm: fieldWidthMm, heightMm: fieldHeightMm };
  const centre = { xMm: field.xMm + fieldWidthMm / 2, yMm: field.yMm + fieldHeightMm / 2 };
  const box = {
    xMm: centre.xMm - artwork.widthMm / 2,
    yMm: centre.yMm - artwork.heightMm / 2,
    widthMm: artwork.widthMm,
    heightMm: artwork.heightMm,
  };
  return {
    id: placement.id,
    placementId: placement.id,
    title: placement.label,
    subtitle: `${mm1(artwork.widthMm)} × ${mm1(artwork.heightMm)} in the ${hoop.name}${fitsAsIs ? '' : ', turned 90° in the hoop'}. ${clearanceText(hoop)}`,
    widthMm: fieldWidthMm + 2 * PADDING_MM,
    heightMm: fieldHeightMm + 2 * PADDING_MM,
    field,
    centre,
    guideLineYMm: null,
    hemLineYMm: null,
    joinMarksXMm: [],
    artwork: box,
    outlines: placeOutlines(artwork.outlines, box.xMm, box.yMm),
    pictureDataUrl: artwork.pictureDataUrl ?? null,
  };
}
