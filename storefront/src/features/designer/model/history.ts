import { findPlacement, isSameDesign, type DesignerState } from './designer-state.ts';

/** Steps kept for undo; older ones are dropped so a long session does not grow without bound. */
const MAX_UNDO_STEPS = 100;

/**
 * Undo history as snapshots. `committed` is the state the last entry left; `present` may run ahead of it while a
 * drag previews, and the command that ends the drag records one entry from `committed`, not one per pointer move.
 * `mergeKey` lets consecutive edits of one field (typing a name) share a single entry.
 */
export interface DesignerHistory {
  past: DesignerState[];
  committed: DesignerState;
  present: DesignerState;
  future: DesignerState[];
  mergeKey: string | null;
}

export const startHistory = (state: DesignerState): DesignerHistory => ({
  past: [],
  committed: state,
  present: state,
  future: [],
  mergeKey: null,
});

/** Shows a state without an undo entry. A new selection is carried into `committed`, so undo never reverts it alone. */
export function preview(history: DesignerHistory, next: DesignerState): DesignerHistory {
  if (next === history.present) return history;
  const { committed } = history;
  const carried = committed.selectedId === next.selectedId ? committed : { ...committed, selectedId: next.selectedId };
  return { ...history, committed: carried, present: next, mergeKey: null };
}

/** Makes `next` the present as one undo entry, or folds it into the last entry when `mergeKey` repeats. */
export function record(history: DesignerHistory, next: DesignerState, mergeKey?: string): DesignerHistory {
  if (isSameDesign(next, history.committed)) return preview(history, next);
  if (mergeKey !== undefined && mergeKey === history.mergeKey)
    return { ...history, committed: next, present: next, future: [] };
  const past = [...history.past, history.committed].slice(-MAX_UNDO_STEPS);
  return { past, committed: next, present: next, future: [], mergeKey: mergeKey ?? null };
}

/** A restored snapshot may select a placement that a later step removed. */
const withLiveSelection = (state: DesignerState): DesignerState =>
  findPlacement(state, state.selectedId) || state.selectedId === null ? state : { ...state, selectedId: null };

export function undo(history: DesignerHistory): DesignerHistory {
  const previous = history.past.at(-1);
  if (!previous) return history;
  const restored = withLiveSelection(previous);
  return {
    past: history.past.slice(0, -1),
    committed: restored,
    present: restored,
    future: [history.committed, ...history.future],
    mergeKey: null,
  };
}

export function redo(history: DesignerHistory): DesignerHistory {
  const [next, ...rest] = history.future;
  if (!next) return history;
  const restored = withLiveSelection(next);
  return {
    past: [...history.past, history.committed],
    committed: restored,
    present: restored,
    future: rest,
    mergeKey: null,
  };
}

export const canUndo = (history: DesignerHistory) => history.past.length > 0;
export const canRedo = (history: DesignerHistory) => history.future.length > 0;
