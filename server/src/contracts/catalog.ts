import { z } from 'zod';

export const garmentSize = z.object({
  id: z.number().int(),
  code: z.string(),
  label: z.string(),
  /** Null for garments without a hem border (bibs, bonnets). */
  hemFrontMm: z.number().nullable(),
  hemCircumferenceMm: z.number().nullable(),
});

export const fabricColour = z.object({ id: z.number().int(), name: z.string(), hex: z.string() });

export const garmentSummary = z.object({
  id: z.number().int(),
  slug: z.string(),
  name: z.string(),
  kind: z.string(),
  description: z.string(),
  fabricType: z.string(),
  mockupSvg: z.string(),
  sizes: z.array(garmentSize),
  colours: z.array(fabricColour),
});
export type GarmentSummary = z.infer<typeof garmentSummary>;

export const garmentListResponse = z.object({ garments: z.array(garmentSummary) });
export type GarmentListResponse = z.infer<typeof garmentListResponse>;

export const motifKind = z.enum(['border', 'single']);

/** A catalogue motif as the storefront shows it: the artwork and the limits it may be resized within. */
export const motifSummary = z.object({
  id: z.number().int(),
  slug: z.string(),
  name: z.string(),
  kind: motifKind,
  svg: z.string(),
  widthMm: z.number(),
  heightMm: z.number(),
  /** Space between border repeats at 100 %, negative for overlap. */
  gapMm: z.number(),
  minScalePct: z.number().int(),
  maxScalePct: z.number().int(),
  colourCount: z.number().int(),
  /** The studio's suggested thread for each colour, in stitching order. */
  threadCodes: z.array(z.string()),
});
export type MotifSummary = z.infer<typeof motifSummary>;

export const motifListResponse = z.object({ motifs: z.array(motifSummary) });
export type MotifListResponse = z.infer<typeof motifListResponse>;
