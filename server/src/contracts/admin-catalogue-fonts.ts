import { z } from 'zod';
import { catalogueName, catalogueSlug, lengthMm, sortOrder } from './admin-catalogue-common.ts';

/** An @fontsource package shipped with the app, such as "@fontsource/pacifico". */
export const fontsourcePackage = z
  .string()
  .trim()
  .regex(/^@fontsource\/[a-z0-9-]+$/, 'Choose one of the fonts shipped with the shop');

const heightFields = {
  name: catalogueName,
  /** Capital-H heights the font sews cleanly at, mm. */
  minHeightMm: lengthMm('the smallest letter height', 200),
  maxHeightMm: lengthMm('the largest letter height', 200),
  sortOrder,
};

const heightsInOrder = (font: { minHeightMm: number; maxHeightMm: number }) => font.minHeightMm <= font.maxHeightMm;
const heightsMessage = { message: 'The largest height must be at least the smallest', path: ['maxHeightMm'] };

export const createFontRequest = z
  .object({ slug: catalogueSlug, fontsourcePackage, ...heightFields })
  .refine(heightsInOrder, heightsMessage);
export type CreateFontRequest = z.infer<typeof createFontRequest>;

/** The slug and the font file stay: designs name the font by slug and were priced with its outlines. */
export const updateFontRequest = z.object(heightFields).refine(heightsInOrder, heightsMessage);
export type UpdateFontRequest = z.infer<typeof updateFontRequest>;

/** A font the server can load and stitch, and whether the catalogue has it already. */
export const shippedFont = z.object({
  fontsourcePackage: z.string(),
  fontFamily: z.string(),
  fileName: z.string(),
  isInCatalogue: z.boolean(),
});
export const shippedFontListResponse = z.object({ fonts: z.array(shippedFont) });
export type ShippedFontListResponse = z.infer<typeof shippedFontListResponse>;
