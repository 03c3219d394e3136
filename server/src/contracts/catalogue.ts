import { z } from 'zod';
import { garmentSafetyFacts, guidanceMessage, motifTrims } from './guidance.ts';

/** A place on the garment where embroidery may go, in the size's own millimetres on the mockup. */
export const placementZone = z.object({
  code: z.string(),
  label: z.string(),
  xMm: z.number(),
  yMm: z.number(),
  widthMm: z.number(),
  heightMm: z.number(),
  /** Hem zones: the border's centre line above the hem edge, mm. */
  hemOffsetMm: z.number().optional(),
  /**
   * Hem zones whose hem is drawn curved (the front of a full skirt seen from the front): how far the ends of the
   * hem edge rise above its middle, which is the zone's bottom, mm. The curve is a parabola across the zone.
   */
  hemCurveMm: z.number().optional(),
});
export type PlacementZoneSummary = z.infer<typeof placementZone>;

export const garmentSize = z.object({
  id: z.number().int(),
  code: z.string(),
  label: z.string(),
  /** The mockup is drawn once at a reference size; this size is the drawing scaled by mockupScale. */
  mockupScale: z.number(),
  zones: z.array(placementZone),
  /** Null for garments without a hem border (bibs, bonnets). */
  hemFrontMm: z.number().nullable(),
  hemCircumferenceMm: z.number().nullable(),
  /** The ages this size is made for, months: the safety cautions assume its youngest wearer. */
  minAgeMonths: z.number().int(),
  maxAgeMonths: z.number().int(),
});

export const fabricColour = z.object({ id: z.number().int(), name: z.string(), hex: z.string() });

export const garmentSummary = z.object({
  id: z.number().int(),
  slug: z.string(),
  name: z.string(),
  kind: z.string(),
  description: z.string(),
  fabricType: z.string(),
  /** Ties, drawstrings, fastening and use: what the safety cautions are worked out from. */
  safety: garmentSafetyFacts,
  mockupSvg: z.string(),
  /** The drawing's size at the reference size, mm (its viewBox). */
  mockupWidthMm: z.number(),
  mockupHeightMm: z.number(),
  sizes: z.array(garmentSize),
  colours: z.array(fabricColour),
});
export type GarmentSummary = z.infer<typeof garmentSummary>;

export const garmentListResponse = z.object({ garments: z.array(garmentSummary) });
export type GarmentListResponse = z.infer<typeof garmentListResponse>;

/** A size on the garment's own page: its measurements too, mm (null where one does not apply, as a bonnet's chest). */
export const garmentSizeDetail = garmentSize.extend({
  chestMm: z.number().nullable(),
  lengthMm: z.number().nullable(),
  /**
   * The safety cautions for this size's youngest wearer and the garment's ties, fastening and use, before any
   * trimmed motif is added (the design's quote adds those); the note deferring to local rules comes last.
   */
  cautions: z.array(guidanceMessage),
});

/** One garment for its product page: the list's summary plus the back drawing (same viewBox) and measured sizes. */
export const garmentDetail = garmentSummary.extend({
  mockupBackSvg: z.string().nullable(),
  sizes: z.array(garmentSizeDetail),
});
export type GarmentDetail = z.infer<typeof garmentDetail>;

export const garmentSlugParams = z.object({
  slug: z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'must be a garment name from the catalogue'),
});
export const garmentDetailResponse = z.object({ garment: garmentDetail });
export type GarmentDetailResponse = z.infer<typeof garmentDetailResponse>;

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
  /** Stitches at 100 %, as measured from the digitized file: what the customer sees as the motif's size of work. */
  stitchCount: z.number().int(),
  /** The studio's suggested thread for each colour, in stitching order. */
  threadCodes: z.array(z.string()),
  /** Trims beyond stitches (appliqué, buttons, bows, beads) that could come off: a small-parts caution for under-3s. */
  trims: z.array(z.enum(motifTrims)),
});
export type MotifSummary = z.infer<typeof motifSummary>;

export const motifListResponse = z.object({ motifs: z.array(motifSummary) });
export type MotifListResponse = z.infer<typeof motifListResponse>;

export const letteringFont = z.object({
  id: z.number().int(),
  slug: z.string(),
  name: z.string(),
  /** The CSS family of the shipped @fontsource font, for showing the lettering as it will be stitched. */
  fontFamily: z.string(),
  minHeightMm: z.number(),
  maxHeightMm: z.number(),
});
export type LetteringFontSummary = z.infer<typeof letteringFont>;
export const fontListResponse = z.object({ fonts: z.array(letteringFont) });
export type FontListResponse = z.infer<typeof fontListResponse>;

export const threadColour = z.object({ code: z.string(), name: z.string(), hex: z.string() });
export type ThreadColourSummary = z.infer<typeof threadColour>;
export const threadListResponse = z.object({ threads: z.array(threadColour) });
export type ThreadListResponse = z.infer<typeof threadListResponse>;

/** A hoop the studio stitches with; the sewing field is the area the machine reaches, mm. */
export const hoopSummary = z.object({
  slug: z.string(),
  name: z.string(),
  fieldWidthMm: z.number(),
  fieldHeightMm: z.number(),
  /** Kept free inside the field at every edge, mm: the stitching fits the field less twice this each way. */
  clearanceMm: z.number(),
});
export type HoopSummary = z.infer<typeof hoopSummary>;
export const hoopListResponse = z.object({ hoops: z.array(hoopSummary) });
export type HoopListResponse = z.infer<typeof hoopListResponse>;
