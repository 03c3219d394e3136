/**
 * The layout notes of a figured design: where two placements would be stitched over each other, by the engine's
 * one overlap rule (the designer warns by the same rule as the customer drags). Items are their stitched box,
 * turned; a border is each of its repeats that shows on the front of the hem, laid out as the proof draws them.
 */
import { layoutHemBorder } from '../../engine/hem-border-layout.ts';
import { findOverlaps, type PlacementOutline } from '../../engine/placement-overlap.ts';
import type { GuidanceMessage } from '../../engine/guidance.ts';
import type { DesignDocument, DesignPlacement } from '../../contracts/designs.ts';
import type { PlacementFigures } from './placement-outcome.ts';
import type { QuoteCatalogue } from './quote-catalogue-types.ts';

/** The stable code of the note, for the apps and tests. */
export const OVERLAP_NOTE_CODE = 'layout.overlap';

function borderOutlines(
  catalogue: QuoteCatalogue,
  placement: Extract<DesignPlacement, { kind: 'border' }>,
  figured: PlacementFigures | undefined,
) {
  const { size } = catalogue;
  const motif = catalogue.motifs.get(placement.motif);
  const zone = size.zones.find((candidate) => candidate.code === 'hem');
  const border = figured?.border;
  if (!motif || !zone || !border || size.hemFrontMm === null) return [];
  const { repeats } = layoutHemBorder({
    zone,
    fit: border.fit,
    isClosed: border.isClosed,
    runLengthMm: border.runLengthMm,
    hemFrontMm: size.hemFrontMm,
    hemOffsetMm: placement.hemOffsetMm,
    motifHeightMm: motif.heightMm,
  });
  return repeats.map((repeat) => ({ placementId: placement.id, ...repeat }));
}

/** Every placement's outlines, mm on the mockup, from the figures the quote was priced from. */
export function designOutlines(
  catalogue: QuoteCatalogue,
  document: DesignDocument,
  figures: readonly PlacementFigures[],
): PlacementOutline[] {
  return document.placements.flatMap((placement): PlacementOutline[] => {
    const figured = figures.find((candidate) => candidate.id === placement.id);
    if (placement.kind === 'border') return borderOutlines(catalogue, placement, figured);
    if (!figured || figured.estimate.widthMm <= 0 || figured.estimate.heightMm <= 0) return [];
    const { centerXMm, centerYMm, rotationDeg } = placement;
    const { widthMm, heightMm } = figured.estimate;
    return [{ placementId: placement.id, centerXMm, centerYMm, widthMm, heightMm, rotationDeg }];
  });
}

/**
 * One note per pair of overlapping placements, named as the quote lines name them. A note, not a refusal: an
 * initial sewn over a motif can be meant, so the customer and the studio are told and decide.
 */
export function overlapNotes(
  catalogue: QuoteCatalogue,
  document: DesignDocument,
  figures: readonly PlacementFigures[],
): GuidanceMessage[] {
  const labelOf = (id: string) => figures.find((candidate) => candidate.id === id)?.label ?? 'A placement';
  return findOverlaps(designOutlines(catalogue, document, figures)).map((overlap) => ({
    code: OVERLAP_NOTE_CODE,
    severity: 'caution',
    title: 'Two parts of the design overlap',
    text: `${labelOf(overlap.firstId)} and ${labelOf(overlap.secondId)} overlap by ${Math.round(overlap.depthMm)} mm, so one would be stitched on top of the other. If that is not meant, move one of them apart.`,
    appliesWhen: 'Two placements on the garment cover the same fabric.',
  }));
}
