import { z } from 'zod';
import { orderStatus } from './order-status.ts';
import { guidanceMessage } from './quotes.ts';
import {
  borderHoopingWarning,
  placementLettering,
  placementPosition,
  sewingOrder,
} from './production-sheet-placement.ts';

/** The paper the sheet is printed on; the PDF lays its pages and tiles out for it. */
export const paperSizes = ['letter', 'a4'] as const;
export type PaperSize = (typeof paperSizes)[number];

export const productionSheetPdfQuery = z.object({
  paper: z.enum(paperSizes, { error: 'Choose letter or a4' }).default('letter'),
});

const threadStep = z.object({
  /** Stitching order, 1 first. */
  order: z.number().int(),
  code: z.string(),
  name: z.string(),
  /** `#rrggbb` from the shop's palette. */
  hex: z.string(),
});

/** The hoop a placement is sewn in; `clearanceMm` is kept free inside the sewing field at every edge. */
const hoop = z.object({
  slug: z.string(),
  name: z.string(),
  fieldWidthMm: z.number(),
  fieldHeightMm: z.number(),
  clearanceMm: z.number(),
});

/**
 * One hooping of a border. `fromCentreMm` is where the hoop's centre goes along the border's guide line,
 * measured from the centre mark: the middle of the row (the garment's centre front), negative to the left and
 * positive to the right as you face the front. On a loop the two ends of the row meet at the back.
 */
const hoopingStep = z.object({
  order: z.number().int(),
  /** One-based, left to right along the row as you face the front. */
  repeatNumbers: z.array(z.number().int()),
  side: z.enum(['center', 'left', 'right']),
  /** The engine's figure: the hoop centre, mm from the row's start (its left end). */
  fromRowStartMm: z.number(),
  fromCentreMm: z.number(),
});

const borderPlan = z.object({
  count: z.number().int(),
  scalePct: z.number(),
  repeatWidthMm: z.number(),
  repeatHeightMm: z.number(),
  pitchMm: z.number(),
  /** The row the repeats fill, mm: the front hem, or the whole way round when `isClosed`. */
  runLengthMm: z.number(),
  isClosed: z.boolean(),
  /** The border's centre line above the hem edge, mm: where the guide line is drawn. */
  hemOffsetMm: z.number(),
  perHooping: z.number().int(),
  /** True when the design is turned 90° in the hoop. */
  isRotated: z.boolean(),
  hoopings: z.array(hoopingStep),
  /** The stitching order's rule in the sheet's words, with this plan's numbering from left to right. */
  orderRule: z.string(),
  /** The hoop's clearance in the sheet's words: what the plan kept free inside the sewing field. */
  clearanceNote: z.string(),
});

const sheetPlacement = z.object({
  id: z.string(),
  kind: z.enum(['border', 'motif', 'lettering', 'artwork']),
  label: z.string(),
  stitches: z.number().int(),
  colourChanges: z.number().int(),
  trims: z.number().int(),
  hoopings: z.number().int(),
  /** Stitched size, mm; a border's whole length along the hem. */
  widthMm: z.number(),
  heightMm: z.number(),
  hoop: hoop.nullable(),
  /** For the customer's own artwork: the palette threads nearest its colours, in the drawing's order. */
  threads: z.array(threadStep),
  border: borderPlan.nullable(),
  /** Where it goes on the garment; null for a border, whose plan says where each hooping goes. */
  position: placementPosition.nullable(),
  lettering: placementLettering.nullable(),
  /** Which step of the sheet's stitching order sews it (1 first). */
  sewOrder: z.number().int(),
  hoopingWarning: borderHoopingWarning.nullable(),
  /** The studio's stitch file for it, once entered after digitizing. */
  stitchFileName: z.string().optional(),
});

/**
 * One piece of the stitched outline in the template's millimetres (SVG path data, y down), with the artwork's
 * colour for it; `isFilled` is false for a line such as a running-stitch stem, which has no inside to tint.
 */
const templateOutline = z.object({ d: z.string(), hex: z.string(), isFilled: z.boolean() });

/**
 * A 1:1 placement template, everything in mm from the template's top-left corner: the stitched outline, the
 * hoop's sewing field, the centre crosshair and, for borders, the guide line, the hem line and the marks where
 * repeats join. The PDF and the studio page draw it from these figures alike.
 */
const placementTemplate = z.object({
  id: z.string(),
  placementId: z.string(),
  title: z.string(),
  subtitle: z.string(),
  widthMm: z.number(),
  heightMm: z.number(),
  field: z.object({ xMm: z.number(), yMm: z.number(), widthMm: z.number(), heightMm: z.number() }),
  centre: z.object({ xMm: z.number(), yMm: z.number() }),
  /** Borders: the border's centre line, which the embroiderer marks on the garment. */
  guideLineYMm: z.number().nullable(),
  hemLineYMm: z.number().nullable(),
  /** Borders: where one repeat meets the next, mm across. */
  joinMarksXMm: z.array(z.number()),
  /** The stitched area's box: a 173 mm repeat is 173 mm wide here. */
  artwork: z.object({ xMm: z.number(), yMm: z.number(), widthMm: z.number(), heightMm: z.number() }),
  outlines: z.array(templateOutline),
  /** A photo or scan of the customer's (no outline to draw): the picture itself, a PNG data URL, in the artwork box. */
  pictureDataUrl: z.string().nullable(),
});
export type PlacementTemplate = z.infer<typeof placementTemplate>;

export const productionSheetResponse = z.object({
  order: z.object({
    number: z.string(),
    status: orderStatus,
    customerName: z.string(),
    neededBy: z.string().nullable(),
    customerNote: z.string().nullable(),
    /** The customer's words on the approved proof (its comment and pinned notes), for the operator to read. */
    approvalNotes: z
      .object({ proofVersion: z.number().int(), comment: z.string().nullable(), pins: z.array(z.string()) })
      .nullable(),
    quantity: z.number().int(),
    designName: z.string(),
  }),
  garment: z.object({
    name: z.string(),
    sizeLabel: z.string(),
    colourName: z.string(),
    colourHex: z.string(),
    fabricType: z.string(),
  }),
  placements: z.array(sheetPlacement),
  sewingOrder,
  totals: z.object({
    stitches: z.number().int(),
    colourChanges: z.number().int(),
    hoopings: z.number().int(),
    trims: z.number().int(),
  }),
  stabilizer: z.object({
    backing: z.enum(['water-soluble-adhesive', 'tearaway', 'cutaway-adhesive', 'cutaway', 'no-show-mesh']),
    topping: z.enum(['water-soluble']).nullable(),
    density: z.enum(['airy', 'medium', 'dense']),
    densityStitchesPerCm2: z.number(),
    backingName: z.string(),
    toppingName: z.string(),
    messages: z.array(guidanceMessage),
  }),
  needle: z.object({ size: z.string(), point: z.string(), note: z.string() }),
  /** One garment, setup included; `orderMinutes` is the whole quantity with the setup counted once. */
  runMinutes: z.object({
    totalMinutes: z.number(),
    orderMinutes: z.number(),
    items: z.array(
      z.object({
        code: z.enum(['sewing', 'color-changes', 'trims', 'hoopings', 'setup']),
        label: z.string(),
        minutes: z.number(),
      }),
    ),
  }),
  cautions: z.array(guidanceMessage),
  templates: z.array(placementTemplate),
});
export type ProductionSheet = z.infer<typeof productionSheetResponse>;
export type SheetPlacement = z.infer<typeof sheetPlacement>;
