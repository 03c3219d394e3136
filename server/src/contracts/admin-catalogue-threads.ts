import { z } from 'zod';
import { catalogueName, hexColour, sortOrder } from './admin-catalogue-common.ts';

/** A thread's code on the shop's shelf, such as "WB-118"; the same shape design documents accept. */
export const threadCodeField = z
  .string()
  .trim()
  .regex(
    /^[A-Za-z0-9][A-Za-z0-9 ._-]{0,19}$/,
    'Use up to 20 letters, digits, spaces, “.”, “_” or “-”, starting with a letter or digit',
  );

/** CIELAB under D65, as stored for thread matching; worked out from the hex colour when left out. */
export const threadLab = z.object({
  l: z.number().min(0, 'L runs from 0 to 100').max(100, 'L runs from 0 to 100'),
  a: z.number().min(-200).max(200),
  b: z.number().min(-200).max(200),
});

const threadFields = {
  name: catalogueName.max(80, 'Keep the name under 80 characters'),
  hex: hexColour,
  lab: threadLab.optional(),
  sortOrder,
};

export const createThreadRequest = z.object({ code: threadCodeField, ...threadFields });
export type CreateThreadRequest = z.infer<typeof createThreadRequest>;

/** The code stays: designs and motifs name threads by it. */
export const updateThreadRequest = z.object(threadFields);
export type UpdateThreadRequest = z.infer<typeof updateThreadRequest>;
