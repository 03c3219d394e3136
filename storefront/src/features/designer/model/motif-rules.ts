import type { MotifSummary } from '@server/contracts/catalog.ts';

/** A size a single motif may be stitched at, whole per cent: a stitch file only resizes within narrow limits. */
export const clampMotifScale = (motif: MotifSummary, scalePct: number) => Math.min(Math.max(Math.round(scalePct), motif.minScalePct), motif.maxScalePct);
