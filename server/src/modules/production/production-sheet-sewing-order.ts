/**
 * The order the placements are stitched in, and which single items lie in a border hooping's sewing field. The
 * rule (common practice, no source): the border first, its hoopings as its plan says; an item lying wholly inside
 * a border hooping's usable field is sewn in that hooping before the hoop comes off, so no hoop is ever clamped
 * over it; an item lying partly in one is sewn after that hooping in its own hoop, hooped clear of the border's
 * stitches; then the other items from the top of the garment down, left before right as you face the front.
 */
import type { SheetPlacement } from '../../contracts/production-sheet.ts';
import { hemCurve, type HemZone } from '../../engine/hem-border-layout.ts';
import { usableField } from '../../engine/hoop-fit.ts';
import { fieldAlongRow } from './production-sheet-templates.ts';

interface Rect {
  left: number;
  top: number;
  right: number;
  bottom: number;
}

export interface PlacedItem {
  placement: SheetPlacement;
  /** Null for a border. */
  where: { centerXMm: number; centerYMm: number; rotationDeg: number } | null;
}

type Warning = NonNullable<SheetPlacement['hoopingWarning']>;

const RULE =
  'Sew the border first, its hoopings in the order its plan gives. A placement lying inside a border hooping’s ' +
  'sewing field is sewn in that hooping, before the hoop comes off; one lying partly in it is sewn after that ' +
  'hooping, in its own hoop, hooped clear of the border’s stitches. Then sew the other placements from the top of ' +
  'the garment down, left before right as you face the front.';

/** The item's box on the garment, turned as placed (the box round the turned stitched size). */
function itemRect(placement: SheetPlacement, where: NonNullable<PlacedItem['where']>): Rect {
  const turn = (where.rotationDeg * Math.PI) / 180;
  const [cos, sin] = [Math.abs(Math.cos(turn)), Math.abs(Math.sin(turn))];
  const halfW = (placement.widthMm * cos + placement.heightMm * sin) / 2;
  const halfH = (placement.widthMm * sin + placement.heightMm * cos) / 2;
  return {
    left: where.centerXMm - halfW,
    right: where.centerXMm + halfW,
    top: where.centerYMm - halfH,
    bottom: where.centerYMm + halfH,
  };
}

const rectAround = (x: number, y: number, along: number, across: number): Rect => ({
  left: x - along / 2,
  right: x + along / 2,
  top: y - across / 2,
  bottom: y + across / 2,
});
const isInside = (inner: Rect, outer: Rect) =>
  inner.left >= outer.left && inner.right <= outer.right && inner.top >= outer.top && inner.bottom <= outer.bottom;
const overlapArea = (a: Rect, b: Rect) =>
  Math.max(0, Math.min(a.right, b.right) - Math.max(a.left, b.left)) *
  Math.max(0, Math.min(a.bottom, b.bottom) - Math.max(a.top, b.top));

/** Each front hooping of a border as its sewing field (and usable field) on the garment, mm. */
function borderFields(border: SheetPlacement, zone: HemZone, hemFrontMm: number) {
  const plan = border.border;
  const hoop = border.hoop;
  if (!plan || !hoop) return [];
  const [along, across] = fieldAlongRow(hoop, plan.repeatHeightMm);
  const usable = usableField(hoop);
  const [usableAlong, usableAcross] =
    along === Math.max(hoop.fieldWidthMm, hoop.fieldHeightMm)
      ? [Math.max(usable.widthMm, usable.heightMm), Math.min(usable.widthMm, usable.heightMm)]
      : [Math.min(usable.widthMm, usable.heightMm), Math.max(usable.widthMm, usable.heightMm)];
  const middleXMm = zone.xMm + zone.widthMm / 2;
  const curve = hemCurve(zone);
  return (
    plan.hoopings
      // On a loop, hoopings past the front panel's ends are round the back, where no single item is placed.
      .filter((hooping) => Math.abs(hooping.fromCentreMm) < (hemFrontMm + along) / 2)
      .map((hooping) => {
        const x = middleXMm + hooping.fromCentreMm;
        const y = zone.yMm + zone.heightMm - plan.hemOffsetMm - curve.riseMm(x);
        return {
          order: hooping.order,
          field: rectAround(x, y, along, across),
          usable: rectAround(x, y, usableAlong, usableAcross),
        };
      })
  );
}

function warningFor(
  item: SheetPlacement,
  rect: Rect,
  borders: readonly { placement: SheetPlacement; fields: ReturnType<typeof borderFields> }[],
): Warning | null {
  let best: { border: SheetPlacement; order: number; area: number; isWhole: boolean } | undefined;
  for (const { placement: border, fields } of borders)
    for (const field of fields) {
      const area = overlapArea(rect, field.field);
      if (area > 0 && (!best || area > best.area))
        best = { border, order: field.order, area, isWhole: isInside(rect, field.usable) };
    }
  if (!best) return null;
  const hoopName = best.border.hoop!.name;
  const own = item.hoop ? `the ${item.hoop.name}` : 'its own hoop';
  return {
    borderPlacementId: best.border.id,
    hoopingOrder: best.order,
    hoopName,
    when: best.isWhole ? 'in-that-hooping' : 'after-that-hooping',
    text: best.isWhole
      ? `Lies inside the sewing field of border hooping ${best.order} (the ${hoopName}): sew it in that hooping, after the border’s repeats and before the hoop comes off.`
      : `Lies partly inside the sewing field of border hooping ${best.order} (the ${hoopName}): sew it after that hooping, in ${own}, hooped so the ring stays clear of the border’s stitches.`,
  };
}

/**
 * The sewing order of the sheet's placements, each placement's step number and warning. `hemZone` and
 * `hemFrontMm` place a border's hoopings on the garment; without them no item can lie in one.
 */
export function planSewingOrder(
  items: readonly PlacedItem[],
  hem: { zone: HemZone; hemFrontMm: number } | undefined,
): {
  sewingOrder: { rule: string; steps: { order: number; placementId: string; text: string }[] };
  byId: Map<string, { sewOrder: number; hoopingWarning: Warning | null }>;
} {
  const borders = items
    .filter((item) => item.placement.border)
    .map((item) => ({
      placement: item.placement,
      fields: hem ? borderFields(item.placement, hem.zone, hem.hemFrontMm) : [],
    }));
  const singles = items
    .filter((item): item is PlacedItem & { where: NonNullable<PlacedItem['where']> } => item.where !== null)
    .map((item) => {
      const rect = itemRect(item.placement, item.where);
      return { ...item, rect, warning: warningFor(item.placement, rect, borders) };
    });
  const steps: { placementId: string; text: string; warning: Warning | null }[] = [];
  for (const border of borders) {
    const count = border.placement.border!.hoopings.length;
    steps.push({
      placementId: border.placement.id,
      text: `${border.placement.label}: ${count === 1 ? 'its one hooping' : `hoopings 1 to ${count}`}, in its plan’s order.`,
      warning: null,
    });
    const within = singles
      .filter(
        (item) => item.warning?.borderPlacementId === border.placement.id && item.warning.when === 'in-that-hooping',
      )
      .sort((a, b) => a.warning!.hoopingOrder - b.warning!.hoopingOrder);
    for (const item of within)
      steps.push({
        placementId: item.placement.id,
        text: `${item.placement.label}: in border hooping ${item.warning!.hoopingOrder}, before the hoop comes off.`,
        warning: item.warning,
      });
  }
  const rest = singles
    .filter((item) => item.warning?.when !== 'in-that-hooping')
    .sort((a, b) => a.rect.top - b.rect.top || a.rect.left - b.rect.left);
  for (const item of rest)
    steps.push({
      placementId: item.placement.id,
      text: item.warning
        ? `${item.placement.label}: after border hooping ${item.warning.hoopingOrder}, in its own hoop.`
        : `${item.placement.label}: in its own hoop.`,
      warning: item.warning,
    });
  const numbered = steps.map((step, index) => ({ order: index + 1, ...step }));
  return {
    sewingOrder: {
      rule: RULE,
      steps: numbered.map(({ order, placementId, text }) => ({ order, placementId, text })),
    },
    byId: new Map(numbered.map((step) => [step.placementId, { sewOrder: step.order, hoopingWarning: step.warning }])),
  };
}
