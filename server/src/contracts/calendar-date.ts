import { z } from 'zod';

/** A calendar day, YYYY-MM-DD, that exists (no 31 November), with the messages a person reads for each mistake. */
export const calendarDate = (messages: { format: string; unreal: string }) =>
  z
    .string({ error: messages.format })
    .regex(/^\d{4}-\d{2}-\d{2}$/, messages.format)
    .refine(
      (value) =>
        !Number.isNaN(Date.parse(`${value}T00:00:00Z`)) &&
        new Date(`${value}T00:00:00Z`).toISOString().startsWith(value),
      messages.unreal,
    );
