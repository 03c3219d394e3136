import type { ArtworkUpload } from '@server/contracts/artwork.ts';
import type {
  GarmentSummary,
  HoopSummary,
  LetteringFontSummary,
  MotifSummary,
  PlacementZoneSummary,
} from '@server/contracts/catalogue.ts';

type GarmentSize = GarmentSummary['sizes'][number];

export interface ExtentMm {
  widthMm: number;
  heightMm: number;
}

/** How big lettering comes out, mm; measuring text needs the browser's fonts, so the render layer supplies it. */
export type LetteringMeasure = (lettering: { text: string; fontFamily: string; letterHeightMm: number }) => ExtentMm;

/** Everything a command needs besides the design: the garment with its sizes and zones, and the catalogue. */
export interface DesignSetting {
  garment: GarmentSummary;
  motifs: readonly MotifSummary[];
  fonts: readonly LetteringFontSummary[];
  measureLettering: LetteringMeasure;
  /** The studio's hoops: nothing single may be larger than the largest sewing field. Empty until they arrive. */
  hoops: readonly HoopSummary[];
  /** The customer's own uploads (theirs alone), which artwork placements refer to by id. */
  artworks: readonly ArtworkUpload[];
}

/** The hem zone's code in the catalogue; a border always runs along it. */
export const HEM_ZONE = 'hem';

export function sizeOf(setting: DesignSetting, sizeId: number): GarmentSize {
  const size = setting.garment.sizes.find((candidate) => candidate.id === sizeId);
  if (!size) throw new Error(`Size ${sizeId} is not a size of ${setting.garment.slug}`);
  return size;
}

export const zoneOf = (size: GarmentSize, code: string): PlacementZoneSummary | undefined =>
  size.zones.find((zone) => zone.code === code);

/** Where a new name or motif goes: the first zone that is not the hem (a yoke, a bib front), else the hem. */
export const defaultItemZone = (size: GarmentSize): PlacementZoneSummary | undefined =>
  size.zones.find((zone) => zone.code !== HEM_ZONE) ?? size.zones[0];

export const motifOf = (setting: DesignSetting, slug: string) => setting.motifs.find((motif) => motif.slug === slug);

export const fontOf = (setting: DesignSetting, slug: string) => setting.fonts.find((font) => font.slug === slug);

/** The mockup's size at this size of the garment, mm: the drawing is made at a reference size and scaled. */
export function mockupSizeMm(garment: GarmentSummary, size: GarmentSize): ExtentMm {
  return { widthMm: garment.mockupWidthMm * size.mockupScale, heightMm: garment.mockupHeightMm * size.mockupScale };
}

export const artworkOf = (setting: DesignSetting, id: number) => setting.artworks.find((artwork) => artwork.id === id);
