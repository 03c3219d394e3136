import { z } from 'zod';
import { designDocument, strictObjectErrors } from './designs.ts';
import { guidanceMessage } from './guidance.ts';
import { quoteShipping, shippingMethod } from './shipping.ts';

export { guidanceMessage };

/** Garments one quote may price: more is a wholesale order the studio quotes by hand. */
const MAX_QUOTE_QUANTITY = 50;

const catalogueId = (what: string) =>
  z
    .number({ error: `Choose a ${what}` })
    .int(`Choose a ${what}`)
    .positive(`Choose a ${what}`);

/** A design to price, without saving it; strict, like the design document. */
export const quotePreviewRequest = z.strictObject(
  {
    garmentId: catalogueId('garment'),
    sizeId: catalogueId('size'),
    colourId: catalogueId('fabric colour').optional(),
    quantity: z
      .number({ error: 'Enter how many garments you would like' })
      .int('Enter a whole number of garments')
      .min(1, 'Order at least 1 garment')
      .max(MAX_QUOTE_QUANTITY, `We can quote up to ${MAX_QUOTE_QUANTITY} garments at a time; get in touch for more`),
    isRush: z.boolean({ error: 'Say whether this is a rush order' }),
    /** How the order reaches the customer; without it the shop's first method (delivery, when offered) is priced. */
    shippingMethod: shippingMethod.optional(),
    document: designDocument,
  },
  strictObjectErrors('the design to price'),
);
export type QuotePreviewRequest = z.infer<typeof quotePreviewRequest>;

/** One priced line; amounts are whole cents for the whole quantity, negative for discounts. */
export const quoteLine = z.object({
  code: z.enum([
    'garment',
    'stitching',
    'lettering',
    'extra-hoopings',
    'color-changes',
    'quantity-discount',
    'rush',
    'artwork-setup',
    'shipping',
    'tax',
  ]),
  label: z.string(),
  amountCents: z.number().int(),
  /** Set on stitching and lettering lines: the design placement they price. */
  placementId: z.string().optional(),
  /** The unit rate the line is priced at, for showing beside its count: 120 per "1,000 stitches". */
  rate: z
    .object({
      cents: z.number().int(),
      per: z.enum(['1,000 stitches', 'garment', 'extra hooping', 'colour change']),
      /** The least the line costs per garment. */
      minimumCents: z.number().int().optional(),
    })
    .optional(),
});
export type QuoteLineShape = z.infer<typeof quoteLine>;

/** The priced quote: the lines, tax included, add up to totalCents. */
const quoteSummary = z.object({
  lines: z.array(quoteLine),
  /** The goods and the work: every line but shipping and tax. Tax is charged on this, not on shipping. */
  subtotalCents: z.number().int(),
  shippingCents: z.number().int(),
  taxCents: z.number().int(),
  totalCents: z.number().int(),
  /** ISO 4217 code. */
  currency: z.string(),
  /** The published price list version the quote was priced with. */
  ruleSetVersion: z.number().int(),
  /** Left out of quotes priced before shipping was quoted. */
  shipping: quoteShipping.optional(),
});

/** What the server worked out for one placement, per garment. */
const figuredPlacement = z.object({
  id: z.string(),
  label: z.string(),
  kind: z.enum(['border', 'motif', 'lettering', 'artwork']),
  stitches: z.number().int(),
  colourChanges: z.number().int(),
  hoopings: z.number().int(),
  /** Borders only: how the repeats fit the hem and the hoop they are stitched in. */
  border: z
    .object({
      count: z.number().int(),
      /** Rounded to 2 places: 96.11 for a 692 mm loop of a 180 mm motif. */
      scalePct: z.number(),
      /** One stitched repeat, mm. */
      repeatWidthMm: z.number(),
      hoopSlug: z.string(),
      hoopName: z.string(),
    })
    .optional(),
  /** Stitched size, mm: a border's whole length along the hem. */
  widthMm: z.number(),
  heightMm: z.number(),
  /**
   * True for a picture the studio has yet to digitize: its stitches are not known, so the price is the minimum and
   * the setup fee, and the studio confirms it after digitizing. Left out otherwise.
   */
  isPriceProvisional: z.boolean().optional(),
});

export const quotePreviewResponse = z.object({
  quote: quoteSummary,
  placements: z.array(figuredPlacement),
  /** Machine and hands-on time for one garment, minutes, with the job's setup counted once. */
  runMinutes: z.object({
    totalMinutes: z.number(),
    items: z.array(
      z.object({
        code: z.enum(['sewing', 'color-changes', 'trims', 'hoopings', 'setup']),
        label: z.string(),
        minutes: z.number(),
      }),
    ),
  }),
  stabilizer: z.object({
    backing: z.enum(['water-soluble-adhesive', 'tearaway', 'cutaway-adhesive', 'cutaway', 'no-show-mesh']),
    topping: z.enum(['water-soluble']).nullable(),
    density: z.enum(['airy', 'medium', 'dense']),
    messages: z.array(guidanceMessage),
  }),
  /** Safety notes for children's garments; guidance only, never a certification. */
  cautions: z.array(guidanceMessage),
  /**
   * The design's hoopings and thread changes in all, per garment, as the quote's lines charge them: each
   * placement's first hooping is in its price (so `extraHoopings` is `hoopings` less one a placement), and the
   * thread changes count those between placements, in the order they are stitched. Left out of older quotes.
   */
  stitching: z
    .object({
      hoopings: z.number().int(),
      extraHoopings: z.number().int(),
      colourChanges: z.number().int(),
      colourChangesBetweenPlacements: z.number().int(),
    })
    .optional(),
  /** Where two placements would be stitched over each other; guidance, not a refusal. Left out by older servers. */
  layoutNotes: z.array(guidanceMessage).optional(),
});
export type QuotePreviewResponse = z.infer<typeof quotePreviewResponse>;
