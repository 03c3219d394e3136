import { z } from 'zod';
import { designDocument, strictObjectErrors } from './designs.ts';
import { designName } from './saved-designs.ts';
import { designUploadPicture } from './artwork.ts';

/** A new name for a saved design; the document stays as it is, so an ordered design may be renamed too. */
export const renameDesignRequest = z.strictObject({ name: designName }, strictObjectErrors('the new name'));
export type RenameDesignRequest = z.infer<typeof renameDesignRequest>;

/** The code of a design's read-only link: random, URL-safe, and the only key to the shared view. */
export const shareTokenParams = z.object({
  token: z.string().regex(/^[A-Za-z0-9_-]{16,64}$/, 'must be the code from a shared link'),
});

export const designShareResponse = z.object({ shareToken: z.string() });
export type DesignShareResponse = z.infer<typeof designShareResponse>;

/**
 * A design as anyone with its link sees it: what is on the garment and nothing about who made it (no account, no
 * design number, no dates).
 */
export const sharedDesign = z.object({
  name: z.string(),
  garmentId: z.number().int(),
  sizeId: z.number().int(),
  colourId: z.number().int(),
  document: designDocument,
  /** The uploads its artwork placements show, fetched through the link. */
  uploads: z.array(designUploadPicture),
});
export type SharedDesign = z.infer<typeof sharedDesign>;
export const sharedDesignResponse = z.object({ design: sharedDesign });
export type SharedDesignResponse = z.infer<typeof sharedDesignResponse>;

/** One upload a shared design places, by the link's code. */
export const sharedUploadParams = shareTokenParams.extend({
  uploadId: z
    .string()
    .regex(/^[1-9]\d{0,9}$/, 'must be a picture number')
    .transform(Number),
});
