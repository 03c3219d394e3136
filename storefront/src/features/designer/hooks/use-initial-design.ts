import { useState } from 'react';
import type { GarmentSummary } from '@server/contracts/catalogue.ts';
import type { SavedDesign } from '@server/contracts/saved-designs.ts';
import { createDesignerState, type DesignerState } from '../model/designer-state.ts';
import { readDesignDraft } from './use-design-draft.ts';
import { designStartOf } from '../model/design-start.ts';

/**
 * Where the designer starts, read once: the saved design being opened, else the draft this tab kept (from before
 * signing in, say), else a bare garment in the size and colour picked on its page (`navigationState`, see
 * `DesignStart`), or its first ones.
 */
export function useInitialDesign(
  garment: GarmentSummary,
  saved: SavedDesign | undefined,
  navigationState: unknown,
): DesignerState {
  const [initial] = useState(() => {
    if (saved) return createDesignerState(saved.sizeId, saved.colourId, saved.document);
    const start = designStartOf(navigationState, garment);
    return readDesignDraft(garment) ?? createDesignerState(start.sizeId, start.colourId);
  });
  return initial;
}
