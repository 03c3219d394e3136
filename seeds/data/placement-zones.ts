/**
 * Placement zones on a garment's mockup. Each mockup is drawn once, at its garment's reference size; a size's
 * zones are the reference zones scaled by that size's mockup_scale, so they are in the size's own millimetres.
 */

import type { PlacementZone as CataloguePlacementZone } from '../../server/src/modules/quotes/quote-catalogue-types.ts';

export type ZoneCode = 'hem' | 'chest' | 'collar' | 'bib_centre' | 'brim';

/** The server's placement zone, with the zone codes the demo garments use. */
export type PlacementZone = CataloguePlacementZone & { code: ZoneCode };

/** 1¾ in: where a hem border's centre line commonly sits above the hem edge (common practice, no source). */
export const defaultHemOffsetMm = 44.45;

const round2 = (value: number) => Math.round(value * 100) / 100;

export function scaleZones(zones: readonly PlacementZone[], scale: number): PlacementZone[] {
  return zones.map((zone) => ({
    ...zone,
    xMm: round2(zone.xMm * scale),
    yMm: round2(zone.yMm * scale),
    widthMm: round2(zone.widthMm * scale),
    heightMm: round2(zone.heightMm * scale),
    ...(zone.hemCurveMm === undefined ? {} : { hemCurveMm: round2(zone.hemCurveMm * scale) }),
  }));
}
