import { z } from 'zod';
import { catalogueName, catalogueSlug, lengthMm, sortOrder } from './admin-catalogue-common.ts';

const hoopFields = {
  name: catalogueName,
  /** The sewing field, not the frame: it is what the hooping plan fits the design into. */
  fieldWidthMm: lengthMm('the field width', 600),
  fieldHeightMm: lengthMm('the field height', 600),
  sortOrder,
};

export const createHoopRequest = z.object({ slug: catalogueSlug, ...hoopFields });
export type CreateHoopRequest = z.infer<typeof createHoopRequest>;

/** The slug stays: placements and plans name hoops by it. */
export const updateHoopRequest = z.object(hoopFields);
export type UpdateHoopRequest = z.infer<typeof updateHoopRequest>;
