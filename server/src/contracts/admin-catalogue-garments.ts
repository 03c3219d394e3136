import { z } from 'zod';
import { garmentSummary } from './catalogue.ts';
import { garmentSafetyFacts } from './guidance.ts';
import { catalogueName, catalogueSlug, hexColour, lengthMm, sortOrder } from './admin-catalogue-common.ts';

export const garmentKinds = ['dress', 'romper', 'bishop_dress', 'bib', 'bonnet'] as const;
export const fabricConstructions = ['woven', 'knit', 'sheer'] as const;
export const zoneCodes = ['hem', 'chest', 'collar', 'bib_centre', 'brim'] as const;

/** Longest mockup drawing accepted, in characters: a flat outline of a garment is a few kilobytes. */
const MAX_MOCKUP_SVG_LENGTH = 500_000;
const ageMonths = z
  .number({ error: 'Enter an age in months' })
  .int('Use whole months')
  .min(0, 'Use 0 or more months')
  .max(216, 'Keep it at or under 216 months');

const garmentFields = {
  name: catalogueName,
  kind: z.enum(garmentKinds, { error: 'Choose what kind of garment it is' }),
  description: z.string().trim().max(2000, 'Keep the description under 2,000 characters'),
  /** Drives the stabilizer advice: knits stretch, wovens are stable, sheers show the backing. */
  fabricType: z.enum(fabricConstructions, { error: 'Choose how the fabric is made' }),
  isNapped: z.boolean(),
  minAgeMonths: ageMonths,
  maxAgeMonths: ageMonths,
  // A form that says nothing of them (an older client) keeps the plain day-wear garment with nothing at the neck.
  tiePlaces: garmentSafetyFacts.shape.tiePlaces.default([]),
  drawstringPlaces: garmentSafetyFacts.shape.drawstringPlaces.default([]),
  closure: garmentSafetyFacts.shape.closure.default('none'),
  closesAtNeck: garmentSafetyFacts.shape.closesAtNeck.default(false),
  intendedUse: garmentSafetyFacts.shape.intendedUse.default('day_wear'),
  sortOrder,
};

const agesInOrder = (garment: { minAgeMonths: number; maxAgeMonths: number }) =>
  garment.minAgeMonths <= garment.maxAgeMonths;
const agesMessage = { message: 'The oldest age must be at least the youngest', path: ['maxAgeMonths'] };
/** The flat front drawing at the reference size, viewBox in millimetres; sanitized by the server before it is kept. */
const mockupSvg = z
  .string()
  .min(1, 'Choose the garment drawing (SVG)')
  .max(MAX_MOCKUP_SVG_LENGTH, 'The drawing is too large; simplify it below 500 kB');

export const createGarmentRequest = z
  .object({ slug: catalogueSlug, ...garmentFields, mockupSvg })
  .refine(agesInOrder, agesMessage);
export type CreateGarmentRequest = z.infer<typeof createGarmentRequest>;

/** The slug stays (it is the storefront address); the drawing is replaced only when sent. */
export const updateGarmentRequest = z
  .object({ ...garmentFields, mockupSvg: mockupSvg.optional() })
  .refine(agesInOrder, agesMessage);
export type UpdateGarmentRequest = z.infer<typeof updateGarmentRequest>;

export const zoneInput = z.object({
  code: z.enum(zoneCodes, { error: 'Choose where on the garment' }),
  label: z.string().trim().min(1, 'Name the place').max(60),
  xMm: z.number({ error: 'Enter mm from the left' }).min(0, 'Use 0 mm or more').max(2000),
  yMm: z.number({ error: 'Enter mm from the top' }).min(0, 'Use 0 mm or more').max(2000),
  widthMm: lengthMm('the width'),
  heightMm: lengthMm('the height'),
  /** Hem zones: the border's default centre line above the hem edge, mm. */
  hemOffsetMm: lengthMm('the distance above the hem', 500).optional(),
});

export const garmentSizeRequest = z
  .object({
    code: z.string().trim().min(1, 'Give the size a code, like 2T').max(10, 'Use at most 10 characters'),
    label: z.string().trim().min(1, 'Give the size a label, like “2 years”').max(40, 'Use at most 40 characters'),
    /** Hem run at the guide line, front panel and whole way round; both null for garments without a hem border. */
    hemFrontMm: lengthMm('the front hem').nullable(),
    hemCircumferenceMm: lengthMm('the hem all round', 4000).nullable(),
    minAgeMonths: ageMonths,
    maxAgeMonths: ageMonths,
    mockupScale: z
      .number({ error: 'Enter the drawing scale' })
      .positive('The scale must be more than 0')
      // The column keeps four decimals; a smaller scale would be stored as 0.
      .min(0.0001, 'Use a scale of at least 0.0001')
      .max(10, 'Keep the scale at or under 10'),
    zones: z.array(zoneInput).min(1, 'Add at least one place for embroidery').max(10, 'Use at most 10 places'),
    sortOrder,
  })
  .superRefine((size, ctx) => {
    if (size.minAgeMonths > size.maxAgeMonths) {
      ctx.addIssue({ code: 'custom', path: ['maxAgeMonths'], message: agesMessage.message });
    }
    if ((size.hemFrontMm === null) !== (size.hemCircumferenceMm === null)) {
      ctx.addIssue({
        code: 'custom',
        path: ['hemCircumferenceMm'],
        message: 'Give both hem lengths, or neither for a garment without a hem border',
      });
    } else if (
      size.hemFrontMm !== null &&
      size.hemCircumferenceMm !== null &&
      size.hemFrontMm > size.hemCircumferenceMm
    ) {
      ctx.addIssue({
        code: 'custom',
        path: ['hemCircumferenceMm'],
        message: 'The hem all round cannot be shorter than the front hem',
      });
    }
    size.zones.forEach((zone, index) => {
      if (zone.code === 'hem' && zone.hemOffsetMm === undefined) {
        ctx.addIssue({
          code: 'custom',
          path: ['zones', index, 'hemOffsetMm'],
          message: 'Say how far above the hem the border sits',
        });
      }
    });
    const seen = new Set<string>();
    size.zones.forEach((zone, index) => {
      if (seen.has(zone.code))
        ctx.addIssue({
          code: 'custom',
          path: ['zones', index, 'code'],
          message: 'Each place may appear once per size',
        });
      seen.add(zone.code);
    });
  });
export type GarmentSizeRequest = z.infer<typeof garmentSizeRequest>;

export const fabricColourRequest = z.object({
  name: catalogueName.max(80, 'Keep the name under 80 characters'),
  hex: hexColour,
  sortOrder,
});
export type FabricColourRequest = z.infer<typeof fabricColourRequest>;

export const garmentPartParams = z.object({
  id: z.coerce.number().int().positive('Use a garment id'),
  partId: z.coerce.number().int().positive('Use a size or colour id'),
});

/** A garment as the studio manages it: the storefront's summary, hidden ones included, with what uses each part. */
export const studioGarment = garmentSummary.extend({
  isActive: z.boolean(),
  isNapped: z.boolean(),
  minAgeMonths: z.number().int(),
  maxAgeMonths: z.number().int(),
  sortOrder: z.number().int(),
  sizes: z.array(garmentSummary.shape.sizes.element.extend({ sortOrder: z.number().int(), isInUse: z.boolean() })),
  colours: z.array(garmentSummary.shape.colours.element.extend({ sortOrder: z.number().int(), isInUse: z.boolean() })),
});
export type StudioGarment = z.infer<typeof studioGarment>;

export const studioGarmentListResponse = z.object({ garments: z.array(studioGarment) });
export type StudioGarmentListResponse = z.infer<typeof studioGarmentListResponse>;
