import { z } from 'zod';

/**
 * The design document: what a customer put on a garment, in the garment's millimetres at the chosen size. It is
 * stored in designs.document and sent with every quote request; the server prices it by recomputing every figure
 * from the catalogue, so nothing in it is a price or a stitch count.
 */

/** The design document's limits, one source for the server's checks and the apps' fields. */
export const designLimits = {
  /** Placements a design may hold: more than this is not one garment's embroidery. */
  maxPlacements: 12,
  /** Longest lettering, in characters: a name or a short phrase on a child's garment. */
  maxLetteringLength: 40,
  /** Most repeats a customer may ask for: more would be a motif narrower than 10 mm round a 2 m hem. */
  maxRequestedRepeats: 200,
  /** Letter heights, mm (each font narrows this to what it sews cleanly). */
  letterHeightMm: { min: 5, max: 100 },
  /** The customer's own artwork, drawn this wide, mm. */
  artworkWidthMm: { min: 5, max: 400 },
  /** A motif's or border's size against its drawing, %. */
  scalePct: { min: 1, max: 400 },
} as const;
const MAX_PLACEMENTS = designLimits.maxPlacements;
const MAX_LETTERING_LENGTH = designLimits.maxLetteringLength;
const MAX_REQUESTED_REPEATS = designLimits.maxRequestedRepeats;
const { letterHeightMm: letterHeight, artworkWidthMm: artworkWidth, scalePct: scale } = designLimits;

/**
 * Objects are strict: every figure is recomputed by the server, so a price, stitch count or hooping sent along
 * is refused with a reason rather than silently ignored. `what` names the object when it is missing altogether.
 */
export function strictObjectErrors(what: string) {
  return {
    error: (issue: z.core.$ZodRawIssue) => {
      if (issue.code === 'unrecognized_keys')
        return `Leave out ${issue.keys.join(', ')}: the server works out prices, stitch counts and hoopings itself`;
      return issue.code === 'invalid_type' ? `Send ${what}` : undefined;
    },
  };
}

const placementId = z.string().regex(/^[A-Za-z0-9_-]{1,40}$/, 'Use 1 to 40 letters, digits, “-” or “_”');
/** Catalogue slugs (motifs, fonts, hoops): lower-case words joined by hyphens. */
const catalogueSlug = z
  .string()
  .max(80)
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'Choose one from the catalogue');
const zoneCode = z.string().regex(/^[a-z][a-z0-9_]{0,39}$/, 'Choose a place on the garment');
/** A thread's code in the shop's palette, such as "WB-118". */
const threadCode = z.string().regex(/^[A-Za-z0-9][A-Za-z0-9 ._-]{0,19}$/, 'Choose a thread from the palette');
const threadCodes = z.array(threadCode).min(1, 'Choose at least one thread').max(20, 'Choose at most 20 threads');
/** The design document's own field rules, for the apps' forms that build a placement. */
export const designFieldRules = { catalogueSlug, zoneCode, threadCode } as const;
/** A position on the garment mockup at this size, mm from its top left corner. */
const mockupMm = z.number().min(0, 'Place it on the garment').max(2000, 'Place it on the garment');

/** Where an item sits: its zone and its centre on the mockup, mm, turned by rotationDeg (clockwise). */
const itemPosition = {
  zone: zoneCode,
  centerXMm: mockupMm,
  centerYMm: mockupMm,
  rotationDeg: z.number().min(-360).max(360),
};

/**
 * A border repeated along the hem: the front panel (an open run) or the whole way round (a closed loop).
 * `count` is the number of repeats the customer asks for; without it the server picks the count that needs the
 * least resizing. `scalePct` and `hoop` record the fit the customer last saw; the server recomputes both.
 */
const borderPlacement = z.strictObject(
  {
    id: placementId,
    kind: z.literal('border'),
    zone: z.literal('hem'),
    motif: catalogueSlug,
    run: z.enum(['front', 'circumference']),
    count: z
      .number()
      .int()
      .min(1, 'Ask for at least 1 repeat')
      .max(MAX_REQUESTED_REPEATS, `Ask for at most ${MAX_REQUESTED_REPEATS} repeats`)
      .optional(),
    scalePct: z.number().min(scale.min).max(scale.max).optional(),
    /** The border's centre line above the hem edge, mm. */
    hemOffsetMm: z.number().min(0).max(500),
    hoop: catalogueSlug.optional(),
    /** One per colour of the motif, in stitching order. */
    threads: threadCodes,
  },
  strictObjectErrors('the border'),
);

/** A single catalogue motif at a scale (100 = as digitized). */
const motifPlacement = z.strictObject(
  {
    id: placementId,
    kind: z.literal('motif'),
    ...itemPosition,
    motif: catalogueSlug,
    scalePct: z
      .number()
      .min(scale.min, `Use a size from ${scale.min} % to ${scale.max} %`)
      .max(scale.max, `Use a size from ${scale.min} % to ${scale.max} %`),
    threads: threadCodes,
  },
  strictObjectErrors('the motif'),
);

/** Text in one of the shop's lettering fonts, sized by the height of a capital H, in one thread. */
const letteringPlacement = z.strictObject(
  {
    id: placementId,
    kind: z.literal('lettering'),
    ...itemPosition,
    text: z
      .string()
      .refine((text) => text.trim() !== '', 'Type the lettering')
      .refine(
        (text) => [...text].length <= MAX_LETTERING_LENGTH,
        `Keep the lettering to ${MAX_LETTERING_LENGTH} characters or fewer`,
      )
      .refine((text) => !/\p{Cc}/u.test(text), 'Lettering is one line of text'),
    font: catalogueSlug,
    letterHeightMm: z
      .number()
      .min(letterHeight.min, `Letters must be at least ${letterHeight.min} mm tall`)
      .max(letterHeight.max, `Letters can be at most ${letterHeight.max} mm tall`),
    thread: threadCode,
  },
  strictObjectErrors('the lettering'),
);

/** The customer's own artwork (an upload), drawn widthMm wide with its height in proportion. */
const artworkPlacement = z.strictObject(
  {
    id: placementId,
    kind: z.literal('artwork'),
    ...itemPosition,
    artworkUploadId: z.number().int().positive(),
    widthMm: z
      .number()
      .min(artworkWidth.min, `Make the artwork at least ${artworkWidth.min} mm wide`)
      .max(artworkWidth.max, `Make the artwork at most ${artworkWidth.max} mm wide`),
  },
  strictObjectErrors('the artwork'),
);

const designPlacement = z.discriminatedUnion(
  'kind',
  [borderPlacement, motifPlacement, letteringPlacement, artworkPlacement],
  {
    error: 'Choose a border, a motif, lettering or artwork',
  },
);

/** Version 1 of the design document, as designs.document stores it. */
export const designDocument = z.strictObject(
  {
    version: z.literal(1),
    placements: z
      .array(designPlacement)
      .max(MAX_PLACEMENTS, `A design can have at most ${MAX_PLACEMENTS} placements`)
      .superRefine((placements, context) => {
        // Quote lines and production sheets name placements by id, so two with one id could not be told apart.
        const seen = new Set<string>();
        placements.forEach((placement, index) => {
          if (seen.has(placement.id))
            context.addIssue({ code: 'custom', path: [index, 'id'], message: 'Another placement already has this id' });
          seen.add(placement.id);
        });
      }),
  },
  strictObjectErrors('the design'),
);

export type BorderPlacement = z.infer<typeof borderPlacement>;
export type MotifPlacement = z.infer<typeof motifPlacement>;
export type LetteringPlacement = z.infer<typeof letteringPlacement>;
export type ArtworkPlacement = z.infer<typeof artworkPlacement>;
export type DesignPlacement = z.infer<typeof designPlacement>;
export type DesignDocument = z.infer<typeof designDocument>;

/**
 * Reads a saved or uploaded design document before use: never use one raw. Version 1 is the only version so
 * far; when the document changes, older versions are migrated up to the current one here, before validating.
 */
export function restoreDesign(raw: unknown): z.ZodSafeParseResult<DesignDocument> {
  return designDocument.safeParse(raw);
}
