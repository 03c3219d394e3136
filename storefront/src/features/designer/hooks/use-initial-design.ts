import { useState } from 'react';
import type { GarmentSummary } from '@server/contracts/catalogue.ts';
import type { SavedDesign } from '@server/contracts/saved-designs.ts';
import { createDesignerState, type DesignerState } from '../model/designer-state.ts';
import { readDesignDraft } from './use-design-draft.ts';

/**
 * Where the designer starts, read once: the saved design being opened, else the draft this tab kept (from before
 * signing in, say), else a bare garment in its first size and colour.
 */
export function useInitialDesign(garment: GarmentSummary, saved: SavedDesign | undefined): DesignerState {
  const [initial] = useState(() => {
    if (saved) return createDesignerState(saved.sizeId, saved.colourId, saved.document);
    return readDesignDraft(garment) ?? createDesignerState(garment.sizes[0]!.id, garment.colours[0]!.id);
  });
  return initial;
}
