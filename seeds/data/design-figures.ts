/**
 * Turns a design spec into what the app would have stored for it: the design document (with the border fit the
 * customer saw) and the figures its quotes are priced from. The figures come from the server's own
 * `figureDesign`, given the seed data as its catalogue, so every seeded quote is what the server computes today.
 */
import { restoreDesign, type DesignDocument, type DesignPlacement } from '../../server/src/contracts/designs.ts';
import {
  DEFAULT_STITCH_SETTINGS,
  measureSvgArtwork,
  type QuotePlacement,
  type SvgArtworkFigures,
} from '../../server/src/engine/index.ts';
import { createLetteringFontLoader } from '../../server/src/integrations/lettering-fonts.ts';
import { figureDesign } from '../../server/src/modules/quotes/design-figures.ts';
import type { PlacementFigures } from '../../server/src/modules/quotes/placement-outcome.ts';
import type { QuoteCatalogue } from '../../server/src/modules/quotes/quote-catalogue-types.ts';
import { artworkUploads, type DesignSpec, type PlacementSpec } from './designs.ts';
import { garments, mockupScale, type SeedGarment, type SeedSize } from './garments.ts';
import { hoops } from './hoops.ts';
import { letteringFonts } from './lettering-fonts.ts';
import { borderGapMm, motifs } from './motifs.ts';
import { scaleZones, type PlacementZone } from './placement-zones.ts';
import { readSeedFile } from './seed-files.ts';
import { shopSettings } from './shop.ts';

/** A seeded upload's stitch measurements, as the server takes them when the file is uploaded. */
export function artworkStitchFigures(file: string): SvgArtworkFigures {
  const measured = measureSvgArtwork(readSeedFile('uploads', file), DEFAULT_STITCH_SETTINGS);
  if (!measured.ok) throw new Error(`The seeded upload ${file} cannot be measured: ${measured.reason}`);
  return measured.figures;
}

export interface DesignFigures {
  garment: SeedGarment;
  size: SeedSize;
  colourId: number;
  document: DesignDocument;
  /** Per garment, one per placement, ready for priceQuote. */
  quotePlacements: QuotePlacement[];
  trims: number;
}

function find<T>(items: readonly T[], matches: (item: T) => boolean, what: string): T {
  const item = items.find(matches);
  if (!item) throw new Error(`Seed data: no ${what}`);
  return item;
}

const fonts = createLetteringFontLoader();

/** The catalogue as 02 and 03 seed it; only the garment and size differ from design to design. */
const seededCatalogue: Omit<QuoteCatalogue, 'garment' | 'size'> = {
  motifs: new Map(
    motifs.map(({ slug, name, kind, widthMm, heightMm, run, satin, fill, minScalePct, maxScalePct, threadCodes }) => [
      slug,
      {
        slug,
        name,
        kind,
        widthMm,
        heightMm,
        gapMm: borderGapMm,
        run,
        satin,
        fill,
        colourCount: threadCodes.length,
        minScalePct,
        maxScalePct,
        trims: [],
      },
    ]),
  ),
  fonts: new Map(
    letteringFonts
      .filter((font) => font.is_active)
      .map((font) => [
        font.slug,
        {
          slug: font.slug,
          name: font.name,
          minHeightMm: font.min_height_mm,
          maxHeightMm: font.max_height_mm,
          outlines: fonts({ fontsourcePackage: font.fontsource_package, fileName: font.file_name }),
        },
      ]),
  ),
  hoops: hoops.map((hoop) => ({
    slug: hoop.slug,
    name: hoop.name,
    fieldWidthMm: hoop.field_width_mm,
    fieldHeightMm: hoop.field_height_mm,
    clearanceMm: hoop.clearance_mm,
  })),
  machine: {
    stitchesPerMinute: shopSettings.machine_stitches_per_minute,
    minutesPerColorChange: shopSettings.minutes_per_colour_change,
    minutesPerHooping: shopSettings.minutes_per_hooping,
    setupMinutes: shopSettings.setup_minutes,
  },
  artworkUploads: new Map(
    artworkUploads.map((upload) => [upload.id, { svgFigures: artworkStitchFigures(upload.file) }]),
  ),
};

const round = (value: number, places: number) => Number(value.toFixed(places));

/** The item's centre on the mockup at this size, mm. */
function centreIn(zone: PlacementZone, at: [number, number] = [50, 50]) {
  return {
    centerXMm: round(zone.xMm + (zone.widthMm * at[0]) / 100, 2),
    centerYMm: round(zone.yMm + (zone.heightMm * at[1]) / 100, 2),
  };
}

/** The placement as the customer laid it out, before the server fits any border. */
function draftPlacement(spec: PlacementSpec, zones: PlacementZone[]): DesignPlacement {
  if (spec.kind === 'border') {
    const zone = find(zones, (candidate) => candidate.code === 'hem', 'hem zone');
    const motif = find(motifs, (candidate) => candidate.slug === spec.motif, `motif ${spec.motif}`);
    if (zone.hemOffsetMm === undefined) throw new Error('Seed data: the hem zone has no hem offset');
    return {
      id: spec.id,
      kind: 'border',
      zone: 'hem',
      motif: spec.motif,
      run: spec.run,
      hemOffsetMm: zone.hemOffsetMm,
      threads: spec.threads ?? motif.threadCodes,
    };
  }
  const zone = find(zones, (candidate) => candidate.code === spec.zone, `zone ${spec.zone}`);
  const position = { zone: spec.zone, ...centreIn(zone, spec.at), rotationDeg: 0 };
  if (spec.kind === 'motif') {
    const motif = find(motifs, (candidate) => candidate.slug === spec.motif, `motif ${spec.motif}`);
    return {
      id: spec.id,
      kind: 'motif',
      ...position,
      motif: spec.motif,
      scalePct: spec.scalePct,
      threads: spec.threads ?? motif.threadCodes,
    };
  }
  if (spec.kind === 'lettering') {
    return {
      id: spec.id,
      kind: 'lettering',
      ...position,
      text: spec.text,
      font: spec.font,
      letterHeightMm: spec.letterHeightMm,
      thread: spec.thread,
    };
  }
  return { id: spec.id, kind: 'artwork', ...position, artworkUploadId: spec.artworkUploadId, widthMm: spec.widthMm };
}

/** A border as saved after the customer saw its fit: the count, scale and hoop the server chose. */
function withFit(placement: DesignPlacement, figures: PlacementFigures): DesignPlacement {
  if (placement.kind !== 'border' || !figures.border) return placement;
  const { id, kind, zone, motif, run, hemOffsetMm, threads } = placement;
  const { count, scalePct, hoop } = figures.border;
  return { id, kind, zone, motif, run, count, scalePct, hemOffsetMm, hoop: hoop.slug, threads };
}

/** What a design is made of: enough to figure a saved design or a visitor's unsaved one. */
export type DesignChoice = Pick<DesignSpec, 'garment' | 'size' | 'colour' | 'placements'>;

export function designFigures(spec: DesignChoice): DesignFigures {
  const garment = find(garments, (candidate) => candidate.slug === spec.garment, `garment ${spec.garment}`);
  const size = find(garment.sizes, (candidate) => candidate.code === spec.size, `size ${spec.size} of ${spec.garment}`);
  const colour = find(garment.colours, (candidate) => candidate.name === spec.colour, `colour ${spec.colour}`);
  const zones = scaleZones(garment.zones, mockupScale(garment, size));
  const catalogue: QuoteCatalogue = {
    ...seededCatalogue,
    garment: {
      id: garment.id,
      slug: garment.slug,
      name: garment.name,
      fabricType: garment.fabricType,
      isNapped: garment.isNapped,
      minAgeMonths: garment.ageMonths[0],
      safety: garment.safety,
    },
    size: {
      id: size.id,
      code: size.code,
      label: size.label,
      hemFrontMm: size.hem?.frontMm ?? null,
      hemCircumferenceMm: size.hem?.circumferenceMm ?? null,
      zones,
      minAgeMonths: size.ageMonths[0],
    },
  };
  const draft: DesignDocument = {
    version: 1,
    placements: spec.placements.map((placement) => draftPlacement(placement, zones)),
  };
  const figured = figureDesign(catalogue, draft);
  if (!figured.ok) throw new Error(`Seed data: ${spec.garment} ${spec.size}: ${figured.error.message}`);
  const restored = restoreDesign({
    version: 1,
    placements: draft.placements.map((placement, i) => withFit(placement, figured.value.placements[i])),
  });
  if (!restored.success)
    throw new Error(
      `Seed data: ${spec.garment} ${spec.size}: the design document is not valid: ${restored.error.message}`,
    );
  return {
    garment,
    size,
    colourId: colour.id,
    document: restored.data,
    quotePlacements: figured.value.quotePlacements,
    trims: figured.value.totals.trims,
  };
}
