import { z } from 'zod';

/**
 * Where a placement's centre goes on the garment, as the operator measures it on the flat garment, front up:
 * across from the centre-front line (negative to the left as you face the front) and up or down from the nearest
 * landmark (the neckline, the hem edge, a brim's edge) on that line. `words` says both in mm and inches.
 */
export const placementPosition = z.object({
  fromCentreFrontMm: z.number(),
  /** The landmark measured from, in words: "neckline", "hem edge". */
  landmark: z.string(),
  /** Positive below the landmark, negative above it. */
  belowLandmarkMm: z.number(),
  /** Clockwise, degrees, as the design turns it. */
  rotationDeg: z.number(),
  words: z.string(),
});

/** Lettering's font and finished letter height (a capital H), for the operator to check against the stitch file. */
export const placementLettering = z.object({
  text: z.string(),
  fontName: z.string(),
  letterHeightMm: z.number(),
  words: z.string(),
});

/**
 * A placement that lies in a border hooping's sewing field: sewn in that hooping (it fits inside the field, so it
 * is sewn before the hoop comes off) or after it in its own hoop (it lies partly under the border's hoop).
 */
export const borderHoopingWarning = z.object({
  borderPlacementId: z.string(),
  hoopingOrder: z.number().int(),
  hoopName: z.string(),
  when: z.enum(['in-that-hooping', 'after-that-hooping']),
  text: z.string(),
});

/** One step of the order placements are stitched in: a placement, or a border's hooping when it shares one. */
export const sewingStep = z.object({
  order: z.number().int(),
  placementId: z.string(),
  text: z.string(),
});

/** The sheet's stitching order: each step and the rule in words. */
export const sewingOrder = z.object({ rule: z.string(), steps: z.array(sewingStep) });
