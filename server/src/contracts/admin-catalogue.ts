import { z } from 'zod';
import { letteringFont, motifSummary, threadColour } from './catalogue.ts';
import { stitchMix } from './admin-catalogue-motifs.ts';

/** A motif as the studio sees it: the customer-facing summary plus the digitized file's measured figures. */
export const studioMotif = motifSummary.extend({
  stitchCount: z.number().int(),
  mix: z.object({ run: z.number().int(), satin: z.number().int(), fill: z.number().int() }),
  isActive: z.boolean(),
  /** Whether stitchCount and mix are the studio's measured count or the engine's estimate from the artwork. */
  stitchCountSource: z.enum(['measured', 'estimate']),
  /** The engine's estimate at 100 % (underlay folded into satin and fill); null for motifs entered before it ran. */
  estimatedMix: stitchMix.nullable(),
});
export type StudioMotif = z.infer<typeof studioMotif>;

/** Threads and fonts as the studio sees them: the customer-facing entries, hidden ones included. */
export const studioThread = threadColour.extend({
  id: z.number().int(),
  isActive: z.boolean(),
  /** CIELAB (D65) as stored for thread matching. */
  lab: z.object({ l: z.number(), a: z.number(), b: z.number() }),
});
export type StudioThread = z.infer<typeof studioThread>;

export const studioHoop = z.object({
  id: z.number().int(),
  slug: z.string(),
  name: z.string(),
  fieldWidthMm: z.number(),
  fieldHeightMm: z.number(),
  clearanceMm: z.number(),
  isActive: z.boolean(),
});
export type StudioHoop = z.infer<typeof studioHoop>;

export const studioFont = letteringFont.extend({ isActive: z.boolean(), fontsourcePackage: z.string() });
export type StudioFont = z.infer<typeof studioFont>;

export const studioCatalogueResponse = z.object({
  motifs: z.array(studioMotif),
  threads: z.array(studioThread),
  hoops: z.array(studioHoop),
  fonts: z.array(studioFont),
});
export type StudioCatalogueResponse = z.infer<typeof studioCatalogueResponse>;
