/**
 * Turns a design document into everything its quote is priced from, with the engine: each placement's stitches,
 * colour changes and hoopings, the machine time, the stabilizer advice and the safety cautions. Pure: the
 * catalogue comes in as plain data, so the server (from the database) and the seeds (from their data files)
 * compute the same figures for the same design.
 */
import {
  adviseStabilizer,
  colourChangesBetween,
  estimateRunMinutes,
  cautionsForGarment,
  type GuidanceMessage,
  type QuotePlacement,
  type RunTimeEstimate,
  type StabilizerAdvice,
} from '../../engine/index.ts';
import type { DesignDocument } from '../../contracts/designs.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import { overlapNotes } from './design-overlaps.ts';
import { figureBorder } from './figure-border.ts';
import { figureItem } from './figure-item.ts';
import type { PlacementFigures } from './placement-outcome.ts';
import type { QuoteCatalogue } from './quote-catalogue-types.ts';

/** Under 3 the stabilizer advice adds a soft cover on the back, matching the cautions' small-parts age. */
const BABY_OR_TODDLER_BELOW_MONTHS = 36;

export interface DesignFigures {
  placements: PlacementFigures[];
  /** One per placement, per garment, ready for `priceQuote`. */
  quotePlacements: QuotePlacement[];
  /**
   * Sums over the placements, per garment. `colourChanges` counts the changes between placements too
   * (`colourChangesBetweenPlacements` of them), in the order the document lists them, which is the stitching order.
   */
  totals: {
    stitches: number;
    colourChanges: number;
    colourChangesBetweenPlacements: number;
    hoopings: number;
    trims: number;
  };
  /** For one garment, setup included. */
  runMinutes: RunTimeEstimate;
  stabilizer: StabilizerAdvice;
  cautions: GuidanceMessage[];
  /** Where two placements would be stitched over each other (the engine's overlap rule); guidance, not a refusal. */
  layoutNotes: GuidanceMessage[];
}

/**
 * Figures a design on the catalogue's garment and size. Every figure is recomputed here; the border fit and hoop
 * a document records are ignored, and a border's `count` is only the customer's wish. Failures are `invalid`
 * with a message a parent can act on, keyed by the field path in the quote request (`document.placements.0.motif`).
 */
export function figureDesign(
  catalogue: QuoteCatalogue,
  document: DesignDocument,
  digitized: ReadonlyMap<string, DigitizedFigures> = new Map(),
): Result<DesignFigures> {
  if (document.placements.length === 0) {
    const message = 'Add a border, a name or a motif so there is embroidery to price.';
    return failure('invalid', message, { 'document.placements': message });
  }
  const outcomes = document.placements.map((placement, index) => {
    const path = `document.placements.${index}`;
    return placement.kind === 'border'
      ? figureBorder(catalogue, placement, path)
      : figureItem(catalogue, placement, path);
  });
  const refusals = outcomes.flatMap((outcome) => (outcome.ok ? [] : [outcome]));
  if (refusals.length > 0) {
    return failure(
      refusals[0].kind ?? 'invalid',
      refusals[0].message,
      Object.fromEntries(refusals.map((refusal) => [refusal.field, refusal.message])),
    );
  }
  const placements = outcomes.flatMap((outcome) =>
    outcome.ok ? [withDigitizedFigures(outcome.figures, digitized.get(outcome.figures.id))] : [],
  );
  const sum = (pick: (figures: PlacementFigures) => number) =>
    placements.reduce((total, figures) => total + pick(figures), 0);
  const changesInto = colourChangesBetween(document.placements.map(threadsOf));
  const colourChangesBetweenPlacements = changesInto.reduce((total, changes) => total + changes, 0);
  const totals = {
    stitches: sum((figures) => figures.estimate.stitches),
    colourChanges: sum((figures) => figures.estimate.colorChanges) + colourChangesBetweenPlacements,
    colourChangesBetweenPlacements,
    hoopings: sum((figures) => figures.hoopings),
    trims: sum((figures) => figures.estimate.trims),
  };

  const runMinutes = estimateRunMinutes({
    stitches: totals.stitches,
    colorChanges: totals.colourChanges,
    hoopings: totals.hoopings,
    trims: totals.trims,
    machine: catalogue.machine,
  });
  if (!runMinutes.ok) return failure('invalid', `The machine time can't be estimated: ${runMinutes.reason}`);
  const stabilizer = adviseDesignStabilizer(catalogue, placements, totals.stitches);
  if (!stabilizer.ok) return failure('invalid', `The stabilizer can't be chosen: ${stabilizer.reason}`);
  // The youngest wearer the chosen size is made for, so the cautions err towards the younger child; trims come
  // with the catalogue's motifs the design places (a stitched name or the customer's picture adds none).
  const hasTrims = document.placements.some(
    (placement) =>
      (placement.kind === 'border' || placement.kind === 'motif') &&
      (catalogue.motifs.get(placement.motif)?.trims.length ?? 0) > 0,
  );
  const cautions = cautionsForGarment(catalogue.garment.safety, catalogue.size.minAgeMonths, hasTrims);
  if (!cautions.ok) return failure('invalid', `The garment cautions can't be given: ${cautions.reason}`);

  return ok({
    placements,
    quotePlacements: placements.map((figures, index) => ({
      id: figures.id,
      label: figures.label,
      kind: figures.kind === 'lettering' ? 'lettering' : 'stitching',
      stitches: figures.estimate.stitches,
      hoopings: figures.hoopings,
      colorChanges: figures.estimate.colorChanges + changesInto[index],
      hasCustomerArtwork: figures.hasCustomerArtwork,
      ...(figures.isPriceProvisional ? { isStitchCountPending: true } : {}),
    })),
    totals,
    runMinutes: { totalMinutes: runMinutes.totalMinutes, items: runMinutes.items },
    stabilizer: {
      densityStitchesPerCm2: stabilizer.densityStitchesPerCm2,
      density: stabilizer.density,
      backing: stabilizer.backing,
      topping: stabilizer.topping,
      messages: stabilizer.messages,
    },
    cautions: cautions.messages,
    layoutNotes: overlapNotes(catalogue, document, placements),
  });
}

/** A placement's threads in stitching order; a customer's picture has none until the studio digitizes it. */
function threadsOf(placement: DesignDocument['placements'][number]): readonly string[] | undefined {
  if (placement.kind === 'border' || placement.kind === 'motif') return placement.threads;
  if (placement.kind === 'lettering') return [placement.thread];
  return undefined;
}

/** What the studio's stitch file of a customer's picture sews: its real stitches and colours. */
export interface DigitizedFigures {
  stitches: number;
  colourCount: number;
}

/**
 * A customer's picture once the studio has digitized it is priced from the stitch file, not the estimate: its
 * stitches, and one colour change between each two of its colours (common practice, no source). Only uploads are
 * digitized by hand; a catalogue motif or lettering keeps its figures.
 */
function withDigitizedFigures(figures: PlacementFigures, file: DigitizedFigures | undefined): PlacementFigures {
  if (!file || figures.kind !== 'artwork') return figures;
  return {
    ...figures,
    estimate: { ...figures.estimate, stitches: file.stitches, colorChanges: Math.max(0, file.colourCount - 1) },
    isPriceProvisional: false,
  };
}

/**
 * One backing for the whole garment, from the design's overall density: all stitches over the sum of the
 * placements' stitched width × height. Summing the areas (rather than taking the box round everything) keeps
 * the bare fabric between a hem border and a chest name from making the design look airy. The engine takes a
 * width and a height, so the summed area goes in as the square of the same area.
 */
function adviseDesignStabilizer(catalogue: QuoteCatalogue, placements: PlacementFigures[], stitches: number) {
  const areaMm2 = placements.reduce(
    (total, figures) => total + figures.estimate.widthMm * figures.estimate.heightMm,
    0,
  );
  const sideMm = Math.sqrt(areaMm2);
  return adviseStabilizer({
    stitches,
    widthMm: sideMm,
    heightMm: sideMm,
    fabric: catalogue.garment.fabricType,
    isNapped: catalogue.garment.isNapped,
    isForBabyOrToddler: catalogue.garment.minAgeMonths < BABY_OR_TODDLER_BELOW_MONTHS,
  });
}
