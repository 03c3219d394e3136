/**
 * The slice of the catalogue one quote needs, as plain data: the garment and size, the motifs and fonts the
 * design names, the hoops and the machine's pace. The server reads it from the database, the seeds build it from
 * their data files, and both hand it to `figureDesign`, so a seeded quote is priced exactly as the server would.
 */
import type {
  FabricConstruction,
  GarmentSafetyFactsInput,
  MachineSettings,
  SvgArtworkFigures,
} from '../../engine/index.ts';
import type { LetteringFont } from '../../integrations/lettering-fonts.ts';

export interface CatalogueGarment {
  id: number;
  slug: string;
  name: string;
  fabricType: FabricConstruction;
  isNapped: boolean;
  /** The youngest wearer the garment is made for, months: the stabilizer's soft back for babies assumes this child. */
  minAgeMonths: number;
  /** Ties, drawstrings, fastening and use, for the safety cautions. */
  safety: GarmentSafetyFactsInput;
}

/** A place on the garment where embroidery may go, in the size's own millimetres. */
export interface PlacementZone {
  code: string;
  label: string;
  xMm: number;
  yMm: number;
  widthMm: number;
  heightMm: number;
  /** Hem zones: the border's centre line above the hem edge, mm. */
  hemOffsetMm?: number;
  /** Hem zones drawn curved: how far the hem edge's ends rise above its middle (the zone's bottom), mm. */
  hemCurveMm?: number;
}

export interface CatalogueSize {
  id: number;
  code: string;
  label: string;
  /** The hem run at the border's guide line, mm; null on garments that take no border. */
  hemFrontMm: number | null;
  hemCircumferenceMm: number | null;
  zones: PlacementZone[];
  /** The youngest wearer this size is made for, months: the safety cautions assume this child. */
  minAgeMonths: number;
}

/** A catalogue motif with the figures measured from its stitch file at 100 %. */
export interface CatalogueMotifEntry {
  slug: string;
  name: string;
  kind: 'border' | 'single';
  widthMm: number;
  heightMm: number;
  /** Space after each border repeat at 100 %, mm; negative overlaps. */
  gapMm: number;
  run: number;
  satin: number;
  fill: number;
  colourCount: number;
  minScalePct: number;
  maxScalePct: number;
  /** Trims beyond stitches (appliqué, buttons, bows, beads), which could come off; empty for stitches only. */
  trims: readonly string[];
}

export interface CatalogueFont {
  slug: string;
  name: string;
  /** Letter heights (capital H) the font sews cleanly at, mm. */
  minHeightMm: number;
  maxHeightMm: number;
  /** Every subset the font ships, and which characters none of them draws. */
  outlines: LetteringFont;
}

export interface CatalogueHoop {
  slug: string;
  name: string;
  /** The sewing field, mm. */
  fieldWidthMm: number;
  fieldHeightMm: number;
  /** Kept free inside the field at every edge, mm. */
  clearanceMm: number;
}

/** The shop's machine settings that `estimateRunMinutes` reads; the time per trim keeps the engine's default. */
export type ShopMachine = Pick<
  MachineSettings,
  'stitchesPerMinute' | 'minutesPerColorChange' | 'minutesPerHooping' | 'setupMinutes'
>;

export interface QuoteCatalogue {
  garment: CatalogueGarment;
  size: CatalogueSize;
  /** By slug; only active motifs, so a retired one reads as unknown. */
  motifs: ReadonlyMap<string, CatalogueMotifEntry>;
  /** By slug; only active fonts. */
  fonts: ReadonlyMap<string, CatalogueFont>;
  /** Active hoops, in any order. */
  hoops: readonly CatalogueHoop[];
  machine: ShopMachine;
  /**
   * The customer's uploads by id, as far as their owner may use them: an SVG's measurements taken at upload,
   * from which the engine counts stitches at any size (null when it could not be measured), or a raster's pixel
   * size, which only the studio can digitize. Absent where uploads
   * are not supported, so artwork placements are refused there; the seeds price their one upload through it.
   */
  artworkUploads?: ReadonlyMap<number, CatalogueArtwork>;
}

export type CatalogueArtwork =
  { svgFigures: SvgArtworkFigures | null } | { rasterSizePx: { widthPx: number; heightPx: number } };
