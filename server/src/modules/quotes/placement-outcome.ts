import type { BorderFit, CatalogueMotif, HoopingPlan, StitchEstimate } from '../../engine/index.ts';
import { fitInField, usableField } from '../../engine/hoop-fit.ts';
import type { DesignPlacement } from '../../contracts/designs.ts';
import type { CatalogueHoop, CatalogueMotifEntry } from './quote-catalogue-types.ts';

/** What one placement costs to sew, per garment. */
export interface PlacementFigures {
  id: string;
  /** Shown on the quote line: "Hem border: Daisy and leaf chain", "Lettering “Clara”". */
  label: string;
  kind: DesignPlacement['kind'];
  estimate: StitchEstimate;
  hoopings: number;
  hasCustomerArtwork: boolean;
  /** The stitches are not known until the studio digitizes the customer's picture, so the price is provisional. */
  isPriceProvisional: boolean;
  /** Borders only: the fit and the hoop it is stitched in. */
  border?: {
    count: number;
    scalePct: number;
    /** One stitched repeat, mm. */
    repeatWidthMm: number;
    /** Start-to-start distance between repeats, mm. */
    pitchMm: number;
    /** The run the repeats fill: the front hem (open) or the whole way round (closed), mm. */
    runLengthMm: number;
    isClosed: boolean;
    hoop: CatalogueHoop;
    /** The engine's hooping plan in that hoop: which repeats each hooping holds, in stitching order. */
    plan: HoopingPlan;
    /** The engine's fit the figures above come from, with each repeat's centre along the run. */
    fit: BorderFit;
  };
}

/** A placement's figures, or why it cannot be sewn, at its field path in the request. */
export type PlacementOutcome =
  { ok: true; figures: PlacementFigures } | { ok: false; field: string; message: string; kind?: 'unprocessable' };

/** A refusal at a field: `invalid` (400) unless the request is well formed but cannot be stitched (422). */
export const refuse = (field: string, message: string, kind?: 'unprocessable'): PlacementOutcome => ({
  ok: false,
  field,
  message,
  ...(kind ? { kind } : {}),
});

export const countOf = (n: number, noun: string) => `${n} ${noun}${n === 1 ? '' : 's'}`;

/** Smallest sewing field first; hoops of equal area keep their catalogue order. */
export function byFieldArea(hoops: readonly CatalogueHoop[]): CatalogueHoop[] {
  return [...hoops].sort((a, b) => a.fieldWidthMm * a.fieldHeightMm - b.fieldWidthMm * b.fieldHeightMm);
}

/** The engine's view of a catalogue motif; its colour changes are between its colours, in stitching order. */
export function catalogueMotifFor(motif: CatalogueMotifEntry): CatalogueMotif {
  return {
    stitchCount: motif.run + motif.satin + motif.fill,
    mix: { run: motif.run, satin: motif.satin, fill: motif.fill },
    colorChanges: motif.colourCount - 1,
    widthMm: motif.widthMm,
    heightMm: motif.heightMm,
  };
}

const mm = (value: number) => `${Number(value.toFixed(1))}`;

/**
 * A single item is sewn in one hooping, so some hoop's field must hold it, either way round. The item's own width
 * and height are checked, not its turned outline: a turned item can be hooped at its angle (common practice, no
 * source). `what` names the item for the message: "The Little lamb at 115 %".
 */
export function checkFitsAHoop(
  hoops: readonly CatalogueHoop[],
  what: string,
  estimate: StitchEstimate,
  field: string,
): PlacementOutcome | undefined {
  const { widthMm, heightMm } = estimate;
  if (smallestHoopHolding(hoops, widthMm, heightMm)) return undefined;
  const largest = byFieldArea(hoops).at(-1);
  const usable = largest && usableField(largest);
  const limit =
    largest && usable
      ? `the ${mm(usable.widthMm)} × ${mm(usable.heightMm)} mm our largest hoop can sew in (its ${mm(largest.fieldWidthMm)} × ${mm(largest.fieldHeightMm)} mm sewing field less ${mm(largest.clearanceMm)} mm clearance at each edge)`
      : 'any hoop the studio has';
  return refuse(field, `${what} comes to ${mm(widthMm)} × ${mm(heightMm)} mm, bigger than ${limit}; make it smaller.`);
}

/** The smallest hoop whose sewing field holds an item of this size either way round, as a single item is hooped. */
export function smallestHoopHolding(
  hoops: readonly CatalogueHoop[],
  widthMm: number,
  heightMm: number,
): CatalogueHoop | undefined {
  return byFieldArea(hoops).find((hoop) => fitInField(hoop, { widthMm, heightMm }) !== undefined);
}
