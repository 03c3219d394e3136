import { z } from 'zod';
import { motifKind } from './catalogue.ts';
import { motifTrims } from './guidance.ts';
import { catalogueName, catalogueSlug, lengthMm, sortOrder } from './admin-catalogue-common.ts';
import { threadCodeField } from './admin-catalogue-threads.ts';

/** Longest motif artwork accepted in a JSON body, characters (the JSON body limit is 1 MB). */
export const MAX_MOTIF_SVG_LENGTH = 900_000;

export const stitchMix = z.object({
  run: z.number().int('Use whole stitches').min(0, 'Use 0 or more'),
  satin: z.number().int('Use whole stitches').min(0, 'Use 0 or more'),
  fill: z.number().int('Use whole stitches').min(0, 'Use 0 or more'),
});
export type StitchMix = z.infer<typeof stitchMix>;

/** The engine's estimate for artwork at its size: top stitches by type, underlay apart, and stops. */
export const motifEstimate = z.object({
  stitchCount: z.number().int(),
  mix: stitchMix,
  underlay: z.number().int(),
  colourChanges: z.number().int(),
  notes: z.array(z.string()),
});
export type MotifEstimate = z.infer<typeof motifEstimate>;

/** Optional form field of the preview upload: the width to stitch a drawing at when it does not say its size. */
export const motifPreviewFields = z.object({
  widthMm: z.preprocess(
    (value) => (value === '' || value === undefined ? undefined : Number(value)),
    lengthMm('the width', 1000).optional(),
  ),
});

export const motifPreviewResponse = z.object({
  /** The uploaded SVG as it will be kept: scripts, handlers and external references removed. */
  svg: z.string(),
  /** Size at 100 %, mm; null when the drawing gives no absolute size and no width was sent. */
  widthMm: z.number().nullable(),
  heightMm: z.number().nullable(),
  estimate: motifEstimate.nullable(),
  /** Why there is no estimate, in words. */
  estimateMessage: z.string().optional(),
  /** The drawing's colours in stitching order, each with the nearest active thread (CIEDE2000). */
  colours: z.array(z.object({ hex: z.string(), threadCode: z.string().nullable() })),
});
export type MotifPreviewResponse = z.infer<typeof motifPreviewResponse>;

const scalePct = z.number({ error: 'Enter a percentage' }).int('Use a whole percentage');

const motifFields = z.object({
  name: catalogueName,
  kind: motifKind,
  svg: z
    .string()
    .min(1, 'Upload the artwork')
    .max(MAX_MOTIF_SVG_LENGTH, 'The artwork is too large; simplify it below 900 kB'),
  widthMm: lengthMm('the width', 1000),
  heightMm: lengthMm('the height', 1000),
  gapMm: z
    .number({ error: 'Enter the gap in mm' })
    .min(-100, 'Overlap at most 100 mm')
    .max(100, 'Keep the gap at or under 100 mm'),
  minScalePct: scalePct.min(1, 'Use at least 1 %').max(100, 'The smallest size cannot be above 100 %'),
  maxScalePct: scalePct.min(100, 'The largest size cannot be below 100 %').max(500, 'Keep it at or under 500 %'),
  threadCodes: z.array(threadCodeField).min(1, 'Choose a thread for each colour').max(20, 'Use at most 20 colours'),
  /**
   * The count from the studio's own digitizing at 100 %. When given, quotes use it instead of the estimate; without
   * a mix, the estimate's share of running, satin and fill is applied to it.
   */
  measured: z
    .object({
      stitchCount: z.number().int('Use whole stitches').min(1, 'Enter at least 1 stitch').max(2_000_000),
      mix: stitchMix.optional(),
    })
    .nullable(),
  /** Trims sewn on beyond the stitches, each of which could come off; none for stitches only. */
  trims: z
    .array(z.enum(motifTrims, { error: 'Choose appliqué, buttons, bows or beads' }))
    .max(4)
    .default([]),
  sortOrder,
});

function mixAddsUp(motif: z.infer<typeof motifFields>, ctx: z.RefinementCtx): void {
  const mix = motif.measured?.mix;
  if (mix && mix.run + mix.satin + mix.fill !== motif.measured!.stitchCount) {
    ctx.addIssue({
      code: 'custom',
      path: ['measured', 'mix'],
      message: 'Running, satin and fill must add up to the measured count',
    });
  }
}

export const createMotifRequest = motifFields.extend({ slug: catalogueSlug }).superRefine(mixAddsUp);
export type CreateMotifRequest = z.infer<typeof createMotifRequest>;

/** The slug stays: saved designs name the motif by it. */
export const updateMotifRequest = motifFields.superRefine(mixAddsUp);
export type UpdateMotifRequest = z.infer<typeof updateMotifRequest>;
