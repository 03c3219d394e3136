/**
 * Turns a design spec into what the app would have stored for it: the design document (with the border fit the
 * customer saw) and the engine's stitch, hooping and colour-change figures that its quotes are priced from. The
 * seeds run the real engine so that every seeded quote agrees with what the server would compute today.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import opentype from 'opentype.js';
import {
  estimateBorderStitches,
  estimateStitches,
  fitBorder,
  planHoopings,
  type EngineResult,
  type QuotePlacement,
  type StitchEstimate,
} from '../../server/src/engine/index.ts';
import { artworkUploads, type DesignSpec, type PlacementSpec } from './designs.ts';
import { garments, mockupScale, type SeedGarment, type SeedSize } from './garments.ts';
import { borderHoops } from './hoops.ts';
import { letteringFonts } from './lettering-fonts.ts';
import { motifs, type SeedMotif } from './motifs.ts';
import { scaleZones, type PlacementZone } from './placement-zones.ts';
import { readSeedFile } from './seed-files.ts';

export interface DesignFigures {
  garment: SeedGarment;
  size: SeedSize;
  colourId: number;
  document: { version: 1; placements: Record<string, unknown>[] };
  /** Per garment, one per placement, ready for priceQuote. */
  quotePlacements: QuotePlacement[];
  trims: number;
}

const requireFromHere = createRequire(import.meta.url);

function must<T>(result: EngineResult<T>, what: string): T {
  if (!result.ok) throw new Error(`Seed data: ${what}: ${result.reason}`);
  return result;
}

function find<T>(items: readonly T[], matches: (item: T) => boolean, what: string): T {
  const item = items.find(matches);
  if (!item) throw new Error(`Seed data: no ${what}`);
  return item;
}

function loadFont(slug: string) {
  const font = find(letteringFonts, (candidate) => candidate.slug === slug, `font ${slug}`);
  const bytes = readFileSync(requireFromHere.resolve(`${font.fontsource_package}/files/${font.file_name}`));
  return opentype.parse(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength));
}

const catalogEntry = (motif: SeedMotif) => ({
  stitchCount: motif.run + motif.satin + motif.fill,
  mix: { run: motif.run, satin: motif.satin, fill: motif.fill },
  colorChanges: motif.threadCodes.length - 1,
  widthMm: motif.widthMm,
  heightMm: motif.heightMm,
});

const round = (value: number, places: number) => Number(value.toFixed(places));

/** The item's centre on the mockup at this size, mm. */
function centreIn(zone: PlacementZone, at: [number, number] = [50, 50]) {
  return { centerXMm: round(zone.xMm + (zone.widthMm * at[0]) / 100, 2), centerYMm: round(zone.yMm + (zone.heightMm * at[1]) / 100, 2) };
}

interface Placed {
  item: Record<string, unknown>;
  estimate: StitchEstimate;
  hoopings: number;
  label: string;
  kind: QuotePlacement['kind'];
  hasCustomerArtwork: boolean;
}

function placeBorder(spec: Extract<PlacementSpec, { kind: 'border' }>, size: SeedSize, zones: PlacementZone[]): Placed {
  const motif = find(motifs, (candidate) => candidate.slug === spec.motif, `motif ${spec.motif}`);
  if (!size.hem) throw new Error(`Seed data: size ${size.code} has no hem for a border`);
  const closed = spec.run === 'circumference';
  const fit = must(
    fitBorder({
      runLengthMm: closed ? size.hem.circumferenceMm : size.hem.frontMm,
      closed,
      motifWidthMm: motif.widthMm,
      minScale: motif.minScalePct / 100,
      maxScale: motif.maxScalePct / 100,
    }),
    `border ${spec.motif} on ${size.code}`,
  );
  const planned = borderHoops
    .map((hoop) => ({
      hoop,
      plan: planHoopings({
        count: fit.count,
        repeatWidthMm: fit.repeatWidthMm,
        pitchMm: fit.pitchMm,
        motifHeightMm: motif.heightMm * fit.scale,
        hoop: { fieldWidthMm: hoop.field_width_mm, fieldHeightMm: hoop.field_height_mm },
        firstCenterMm: fit.centersMm[0],
      }),
    }))
    .find((candidate) => candidate.plan.ok);
  if (!planned?.plan.ok) throw new Error(`Seed data: no border hoop holds a repeat of ${spec.motif}`);
  const { hoop, plan } = planned;
  const repeat = must(estimateStitches({ kind: 'catalog', motif: catalogEntry(motif), scale: fit.scale }), spec.motif);
  const estimate = must(estimateBorderStitches({ repeat, fit, hoopings: plan.hoopings.length }), `border ${spec.motif}`);
  const zone = find(zones, (candidate) => candidate.code === 'hem', 'hem zone');
  return {
    item: {
      id: spec.id,
      kind: 'border',
      zone: 'hem',
      motif: motif.slug,
      run: spec.run,
      count: fit.count,
      scalePct: round(fit.scale * 100, 2),
      hemOffsetMm: zone.hemOffsetMm,
      hoop: hoop.slug,
      threads: spec.threads ?? motif.threadCodes,
    },
    estimate,
    hoopings: plan.hoopings.length,
    label: `Hem border: ${motif.name}`,
    kind: 'stitching',
    hasCustomerArtwork: false,
  };
}

function placeItem(spec: Exclude<PlacementSpec, { kind: 'border' }>, zones: PlacementZone[]): Placed {
  const zone = find(zones, (candidate) => candidate.code === spec.zone, `zone ${spec.zone}`);
  const common = { id: spec.id, kind: spec.kind, zone: spec.zone, ...centreIn(zone, spec.at), rotationDeg: 0 };
  if (spec.kind === 'motif') {
    const motif = find(motifs, (candidate) => candidate.slug === spec.motif, `motif ${spec.motif}`);
    const estimate = must(estimateStitches({ kind: 'catalog', motif: catalogEntry(motif), scale: spec.scalePct / 100 }), spec.motif);
    const item = { ...common, motif: motif.slug, scalePct: spec.scalePct, threads: spec.threads ?? motif.threadCodes };
    return { item, estimate, hoopings: 1, label: motif.name, kind: 'stitching', hasCustomerArtwork: false };
  }
  if (spec.kind === 'lettering') {
    const estimate = must(
      estimateStitches({ kind: 'lettering', text: spec.text, font: loadFont(spec.font), letterHeightMm: spec.letterHeightMm }),
      `lettering ${spec.text}`,
    );
    const item = { ...common, text: spec.text, font: spec.font, letterHeightMm: spec.letterHeightMm, thread: spec.thread };
    return { item, estimate, hoopings: 1, label: `Lettering “${spec.text}”`, kind: 'lettering', hasCustomerArtwork: false };
  }
  const upload = find(artworkUploads, (candidate) => candidate.id === spec.artworkUploadId, `upload ${spec.artworkUploadId}`);
  const svgText = readSeedFile('uploads', upload.file);
  const estimate = must(estimateStitches({ kind: 'svg', svgText, size: { widthMm: spec.widthMm } }), 'customer artwork');
  const item = { ...common, artworkUploadId: spec.artworkUploadId, widthMm: spec.widthMm };
  return { item, estimate, hoopings: 1, label: 'Your artwork', kind: 'stitching', hasCustomerArtwork: true };
}

/** What a design is made of: enough to figure a saved design or a visitor's unsaved one. */
export type DesignChoice = Pick<DesignSpec, 'garment' | 'size' | 'colour' | 'placements'>;

export function designFigures(spec: DesignChoice): DesignFigures {
  const garment = find(garments, (candidate) => candidate.slug === spec.garment, `garment ${spec.garment}`);
  const size = find(garment.sizes, (candidate) => candidate.code === spec.size, `size ${spec.size} of ${spec.garment}`);
  const colour = find(garment.colours, (candidate) => candidate.name === spec.colour, `colour ${spec.colour}`);
  const zones = scaleZones(garment.zones, mockupScale(garment, size));
  const placed = spec.placements.map((placement) =>
    placement.kind === 'border' ? placeBorder(placement, size, zones) : placeItem(placement, zones),
  );
  return {
    garment,
    size,
    colourId: colour.id,
    document: { version: 1, placements: placed.map((entry) => entry.item) },
    quotePlacements: placed.map((entry) => ({
      id: String(entry.item.id),
      label: entry.label,
      kind: entry.kind,
      stitches: entry.estimate.stitches,
      hoopings: entry.hoopings,
      colorChanges: entry.estimate.colorChanges,
      hasCustomerArtwork: entry.hasCustomerArtwork,
    })),
    trims: placed.reduce((sum, entry) => sum + entry.estimate.trims, 0),
  };
}
