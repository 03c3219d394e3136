import { useEffect } from 'react';
import type { GarmentSummary } from '@server/contracts/catalogue.ts';
import type { DesignerState } from '../model/designer-state.ts';
import { draftOf, restoreDraft } from '../model/draft.ts';

const draftKey = (garmentSlug: string) => `hoopwright.design-draft.${garmentSlug}`;

/** The draft kept for this garment in this tab, if there is one fit to use. */
export function readDesignDraft(garment: GarmentSummary): DesignerState | undefined {
  try {
    return restoreDraft(sessionStorage.getItem(draftKey(garment.slug)), garment);
  } catch {
    // Storage switched off: there is no draft to read.
    return undefined;
  }
}

/**
 * Keeps the design in this tab's session storage while it has not been saved, so signing in (which leaves the
 * site and comes back) or a reload does not lose it. Storage can be full or switched off; the design then simply
 * lives only on the page, as it would anyway.
 */
export function useDesignDraft(garmentSlug: string, state: DesignerState, isKept: boolean): void {
  const { sizeId, colourId, document } = state;
  useEffect(() => {
    try {
      if (isKept)
        sessionStorage.setItem(draftKey(garmentSlug), JSON.stringify(draftOf({ sizeId, colourId, document })));
      else sessionStorage.removeItem(draftKey(garmentSlug));
    } catch {
      // See above: without storage there is nothing to keep the draft in.
    }
  }, [garmentSlug, sizeId, colourId, document, isKept]);
}
