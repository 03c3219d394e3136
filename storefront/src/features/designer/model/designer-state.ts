import {
  designLimits,
  type ArtworkPlacement,
  type DesignDocument,
  type DesignPlacement,
  type LetteringPlacement,
  type MotifPlacement,
} from '@server/contracts/designs.ts';

/** Most placements the design document accepts (server/src/contracts/designs.ts). */
export const MAX_PLACEMENTS = designLimits.maxPlacements;

/**
 * What the customer is designing: the document in the garment's millimetres at the chosen size, the size and fabric
 * colour it is for, and which placement is selected. Undo history stores snapshots of this.
 */
export interface DesignerState {
  document: DesignDocument;
  sizeId: number;
  colourId: number;
  selectedId: string | null;
}

/** Placements the customer moves and turns freely inside a zone; borders follow the hem and move only up and down. */
export type ItemPlacement = MotifPlacement | LetteringPlacement | ArtworkPlacement;

export const isItem = (placement: DesignPlacement): placement is ItemPlacement => placement.kind !== 'border';

export function createDesignerState(
  sizeId: number,
  colourId: number,
  document: DesignDocument = { version: 1, placements: [] },
): DesignerState {
  return { document, sizeId, colourId, selectedId: null };
}

export const findPlacement = (state: DesignerState, id: string | null) =>
  state.document.placements.find((placement) => placement.id === id);

export const hasRoomForPlacement = (state: DesignerState) => state.document.placements.length < MAX_PLACEMENTS;

/** Swaps one placement for its new version, keeping the order (the order is the stitching order on the proof). */
export function replacePlacement(state: DesignerState, next: DesignPlacement): DesignerState {
  const placements = state.document.placements.map((placement) => (placement.id === next.id ? next : placement));
  return { ...state, document: { ...state.document, placements } };
}

export function appendPlacement(state: DesignerState, placement: DesignPlacement): DesignerState {
  return {
    ...state,
    document: { ...state.document, placements: [...state.document.placements, placement] },
    selectedId: placement.id,
  };
}

/** The first free id from a stem: "name", then "name-2", "name-3"; quote lines and proofs refer to placements by id. */
export function nextPlacementId(state: DesignerState, stem: string): string {
  const taken = new Set(state.document.placements.map((placement) => placement.id));
  if (!taken.has(stem)) return stem;
  let n = 2;
  while (taken.has(`${stem}-${n}`)) n += 1;
  return `${stem}-${n}`;
}

/** Two states that differ at most in their selection: nothing the customer would want to undo. */
export const isSameDesign = (a: DesignerState, b: DesignerState) =>
  a.document === b.document && a.sizeId === b.sizeId && a.colourId === b.colourId;
