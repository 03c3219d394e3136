import { z } from 'zod';
import type { GarmentSummary } from '@server/contracts/catalogue.ts';
import { restoreDesign } from '@server/contracts/designs.ts';
import { createDesignerState, type DesignerState } from './designer-state.ts';

/** An unsaved design kept in the browser tab, so it survives the round trip through sign-in. */
const draftEnvelope = z.object({ sizeId: z.number().int(), colourId: z.number().int(), document: z.unknown() });

export const draftOf = ({ sizeId, colourId, document }: Pick<DesignerState, 'sizeId' | 'colourId' | 'document'>) => ({
  sizeId,
  colourId,
  document,
});

/**
 * A kept draft back as designer state, or undefined when there is none fit to use: unreadable, for a size or colour
 * the garment no longer has, or a document the contract's restoreDesign refuses.
 */
export function restoreDraft(raw: string | null, garment: GarmentSummary): DesignerState | undefined {
  if (raw === null) return undefined;
  let parsed: unknown;
  try {
    parsed = JSON.parse(raw);
  } catch {
    return undefined;
  }
  const envelope = draftEnvelope.safeParse(parsed);
  if (!envelope.success) return undefined;
  const { sizeId, colourId, document } = envelope.data;
  const restored = restoreDesign(document);
  const isOnOffer =
    garment.sizes.some((size) => size.id === sizeId) && garment.colours.some((colour) => colour.id === colourId);
  return restored.success && isOnOffer ? createDesignerState(sizeId, colourId, restored.data) : undefined;
}
