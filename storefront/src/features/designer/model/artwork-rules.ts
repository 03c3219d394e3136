import type { ArtworkUpload } from '@server/contracts/artwork.ts';
import type { PlacementZoneSummary } from '@server/contracts/catalogue.ts';
import { designLimits } from '@server/contracts/designs.ts';
import type { DesignSetting } from './design-setting.ts';
import { largestFactorInHoops } from './hoop-limit.ts';

/** The design document's limits for artwork width. */
const { min: DOCUMENT_MIN_WIDTH_MM, max: DOCUMENT_MAX_WIDTH_MM } = designLimits.artworkWidthMm;
/** A child's drawing usually reads well about this wide on a yoke or bib (common practice, no source). */
export const STARTING_WIDTH_MM = 60;

const tenths = (value: number) => Math.floor(value * 10) / 10;

/**
 * How wide the customer's artwork may be drawn, mm: upright, it must fit inside its zone and inside the largest
 * hoop's sewing field, and within the document's limits. `limitedBy` names what sets the top, for the panel.
 */
export function artworkWidthRange(
  setting: DesignSetting,
  artwork: ArtworkUpload | undefined,
  zone: PlacementZoneSummary | undefined,
) {
  const aspect = artwork ? artwork.heightPx / artwork.widthPx : 1;
  const zoneMaxMm = zone ? Math.min(zone.widthMm, zone.heightMm / aspect) : Number.POSITIVE_INFINITY;
  const hoopMaxMm = largestFactorInHoops({ widthMm: 1, heightMm: aspect }, setting.hoops);
  const maxMm = Math.max(DOCUMENT_MIN_WIDTH_MM, tenths(Math.min(zoneMaxMm, hoopMaxMm, DOCUMENT_MAX_WIDTH_MM)));
  const limitedBy = maxMm === tenths(zoneMaxMm) ? 'zone' : maxMm === tenths(hoopMaxMm) ? 'hoop' : 'document';
  return { minMm: DOCUMENT_MIN_WIDTH_MM, maxMm, limitedBy } as const;
}

export function clampArtworkWidth(range: { minMm: number; maxMm: number }, widthMm: number): number {
  return Math.min(Math.max(Math.round(widthMm * 10) / 10, range.minMm), range.maxMm);
}
