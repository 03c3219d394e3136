import { z } from 'zod';

/**
 * The customer's own artwork: an upload kept as a clean copy (a sanitized SVG, or a raster re-encoded as PNG).
 * Only its owner reaches it: the account that uploaded it, or, before signing in, the browser session that did.
 */
export const artworkIdParams = z.object({
  id: z
    .string()
    .regex(/^[1-9]\d{0,9}$/, 'must be an artwork number')
    .transform(Number),
});

export const artworkUpload = z.object({
  id: z.number().int(),
  /** `svg`: drawn lines and shapes the engine can count stitches from; `raster`: a photo or scan to digitize. */
  kind: z.enum(['svg', 'raster']),
  originalName: z.string(),
  /** The stored clean copy's size in bytes. */
  byteSize: z.number().int(),
  /** The picture's own size: an SVG's viewBox or width and height, a raster's pixels. Sets its proportions. */
  widthPx: z.number().int().positive(),
  heightPx: z.number().int().positive(),
  /** Where the owner's browser fetches the clean copy. */
  imageUrl: z.string(),
  createdAt: z.string(),
});
export type ArtworkUpload = z.infer<typeof artworkUpload>;

export const artworkUploadResponse = z.object({ artwork: artworkUpload });
export const artworkListResponse = z.object({ artworks: z.array(artworkUpload) });

/**
 * An upload a design places, as every picture of the design draws it: its proportions (which set its height at the
 * placement's width) and where the viewer's browser fetches it (the owner's own address, or the shared link's).
 */
export const designUploadPicture = z.object({
  uploadId: z.number().int(),
  widthPx: z.number().int().positive(),
  heightPx: z.number().int().positive(),
  imageUrl: z.string(),
});
export type DesignUploadPicture = z.infer<typeof designUploadPicture>;
