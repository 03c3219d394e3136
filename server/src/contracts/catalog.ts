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
