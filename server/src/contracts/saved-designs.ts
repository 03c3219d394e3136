import { z } from 'zod';
import { designDocument, strictObjectErrors } from './designs.ts';
import { designUploadPicture } from './artwork.ts';

const catalogueId = (what: string) =>
  z
    .number({ error: `Choose a ${what}` })
    .int(`Choose a ${what}`)
    .positive(`Choose a ${what}`);

export const designIdParams = z.object({
  id: z
    .string()
    .regex(/^[1-9]\d{0,9}$/, 'must be a design number')
    .transform(Number),
});

/** The name a customer gives a design. */
export const designName = z.string().trim().min(1, 'Give the design a name').max(80, 'Keep the name to 80 characters');

/** What a customer saves: the garment, size and colour chosen, a name of their own, and the document. */
export const saveDesignRequest = z.strictObject(
  {
    garmentId: catalogueId('garment'),
    sizeId: catalogueId('size'),
    colourId: catalogueId('fabric colour'),
    name: designName,
    document: designDocument,
  },
  strictObjectErrors('the design to save'),
);
export type SaveDesignRequest = z.infer<typeof saveDesignRequest>;

export const savedDesign = z.object({
  id: z.number().int(),
  name: z.string(),
  garmentId: z.number().int(),
  sizeId: z.number().int(),
  colourId: z.number().int(),
  document: designDocument,
  /** The customer's uploads its artwork placements show. */
  uploads: z.array(designUploadPicture),
  /** The code of its read-only link while the customer shares it, else null. */
  shareToken: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type SavedDesign = z.infer<typeof savedDesign>;

export const savedDesignResponse = z.object({ design: savedDesign });
export const savedDesignListResponse = z.object({ designs: z.array(savedDesign) });
