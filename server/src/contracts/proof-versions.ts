import { z } from 'zod';
import { designDocument } from './designs.ts';
import { quoteLine } from './quotes.ts';

/**
 * What the studio enters once it has digitized a customer's picture, the studio's re-priced drafts of an order's
 * design, and the price and changes each proof version carries. The server prices every figure itself: nothing
 * here the client sends is a price.
 */

/** Stitch files a machine reads: a plain file name with its extension, no folders. */
const stitchFileName = z
  .string({ error: 'Type the stitch file’s name' })
  .trim()
  .min(1, 'Type the stitch file’s name')
  .max(120, 'Keep the file name under 120 characters')
  .regex(
    /^[A-Za-z0-9][A-Za-z0-9 ._()-]*\.[A-Za-z0-9]{2,4}$/,
    'Use a file name with its extension, such as sun-56mm.dst',
  );

/** The studio's limits for a stitch file's figures: more than this is not one placement on a child's garment. */
export const stitchFileLimits = { maxStitches: 500_000, maxColours: 30 } as const;

export const stitchFileRequest = z.strictObject(
  {
    stitchCount: z
      .number({ error: 'Type the stitch count as a number' })
      .int('Type a whole number of stitches')
      .min(1, 'A stitch file has at least 1 stitch')
      .max(
        stitchFileLimits.maxStitches,
        `Check the count: a placement has at most ${stitchFileLimits.maxStitches.toLocaleString('en-US')} stitches`,
      ),
    colourCount: z
      .number({ error: 'Type how many colours the file sews' })
      .int('Type a whole number of colours')
      .min(1, 'A stitch file sews at least 1 colour')
      .max(stitchFileLimits.maxColours, `A stitch file sews at most ${stitchFileLimits.maxColours} colours`),
    fileName: stitchFileName,
  },
  {
    error: (issue) =>
      issue.code === 'unrecognized_keys'
        ? `Leave out ${issue.keys.join(', ')}: the server works out the price itself`
        : undefined,
  },
);
export type StitchFileRequest = z.infer<typeof stitchFileRequest>;

export const stitchFileParams = z.object({
  number: z.string().regex(/^[A-Z]{2}-\d{1,10}$/, 'must look like WB-1001'),
  placementId: z.string().regex(/^[A-Za-z0-9_-]{1,40}$/, 'is not a placement of this design'),
});

/** The studio's draft of the order's design: priced and drawn, never stored until it is sent as a proof. */
export const proofDraftRequest = z.strictObject({ document: designDocument }, { error: () => 'Send the design' });
export type ProofDraftRequest = z.infer<typeof proofDraftRequest>;

// The quote's own line shape, unit rates included, so a proof's lines read as the quote's do.
const priceLine = quoteLine;

/** A design priced by the server, against what the customer authorized. */
export const repricedOrder = z.object({
  /** The order's total now: what the customer authorized (or last approved). */
  authorizedTotalCents: z.number().int(),
  subtotalCents: z.number().int(),
  taxCents: z.number().int(),
  totalCents: z.number().int(),
  /** The new total less the authorized one: positive when the price rises. */
  differenceCents: z.number().int(),
  currency: z.string(),
  lines: z.array(priceLine),
  /** What differs from the last version the customer saw, in words ("Name moved 5 mm up"). */
  changes: z.array(z.string()),
  /** True while an uploaded picture is still priced at the minimum, its stitch file not yet entered. */
  isPriceProvisional: z.boolean(),
});
export type RepricedOrder = z.infer<typeof repricedOrder>;

export const stitchFile = z.object({
  placementId: z.string(),
  stitchCount: z.number().int(),
  colourCount: z.number().int(),
  fileName: z.string(),
  enteredByName: z.string(),
  updatedAt: z.string(),
});
export type StitchFile = z.infer<typeof stitchFile>;

export const stitchFileResponse = z.object({ stitchFile, price: repricedOrder });
export type StitchFileResponse = z.infer<typeof stitchFileResponse>;

/** Everything the studio's editor starts from: the design as the customer last saw it and its price now. */
export const orderDesignResponse = z.object({
  number: z.string(),
  garmentId: z.number().int(),
  sizeId: z.number().int(),
  /** Mockup drawing size at this garment size, mm, so positions can be given from the centre front. */
  mockupWidthMm: z.number(),
  mockupHeightMm: z.number(),
  document: designDocument,
  /** The proof version this design comes from; 0 for the design as ordered. */
  fromVersion: z.number().int(),
  /** The number the next proof will carry. */
  nextVersion: z.number().int(),
  price: repricedOrder,
  stitchFiles: z.array(stitchFile),
});
export type OrderDesignResponse = z.infer<typeof orderDesignResponse>;

/** The price a proof carries and what changed, as the customer and the studio read it; null for seeded history. */
export const proofPrice = z
  .object({
    previousTotalCents: z.number().int(),
    totalCents: z.number().int(),
    lines: z.array(priceLine),
  })
  .nullable();
export type ProofPrice = z.infer<typeof proofPrice>;
