import { z } from 'zod';
import { catalogueName, catalogueSlug, lengthMm, sortOrder } from './admin-catalogue-common.ts';

/** A few millimetres free at each edge of the field: common practice, no source (see the hoops migration). */
export const DEFAULT_HOOP_CLEARANCE_MM = 3;
export const MAX_HOOP_CLEARANCE_MM = 25;

/** Kept free inside the field at every edge, mm. */
const clearanceMm = z
  .number({ error: 'Enter the clearance in millimetres' })
  .min(0, 'The clearance cannot be less than 0 mm')
  .max(MAX_HOOP_CLEARANCE_MM, `Keep the clearance at or under ${MAX_HOOP_CLEARANCE_MM} mm`);

const hoopFields = {
  name: catalogueName,
  /** The sewing field, not the frame: it is what the hooping plan fits the design into. */
  fieldWidthMm: lengthMm('the field width', 600),
  fieldHeightMm: lengthMm('the field height', 600),
  sortOrder,
};

/** The clearance must leave some field to sew in, across and along. */
const leavesAField = (hoop: { fieldWidthMm: number; fieldHeightMm: number; clearanceMm?: number }) =>
  hoop.clearanceMm === undefined || 2 * hoop.clearanceMm < Math.min(hoop.fieldWidthMm, hoop.fieldHeightMm);
const leavesAFieldMessage = {
  message: 'The clearance at both edges must be less than the field’s shorter side',
  path: ['clearanceMm'],
};

/** A new hoop keeps the default clearance unless the studio gives its own. */
export const createHoopRequest = z
  .object({ slug: catalogueSlug, ...hoopFields, clearanceMm: clearanceMm.default(DEFAULT_HOOP_CLEARANCE_MM) })
  .refine(leavesAField, leavesAFieldMessage);
export type CreateHoopRequest = z.infer<typeof createHoopRequest>;

/** The slug stays: placements and plans name hoops by it. Without a clearance the hoop keeps its own. */
export const updateHoopRequest = z
  .object({ ...hoopFields, clearanceMm: clearanceMm.optional() })
  .refine(leavesAField, leavesAFieldMessage);
export type UpdateHoopRequest = z.infer<typeof updateHoopRequest>;
