import { z } from 'zod';

/**
 * Field shapes shared by the studio's catalogue forms. Messages are written for the person filling the form, as
 * the server sends them back beside the field and the forms show the same words before sending.
 */

/** URL and design-document names: lower-case words joined by hyphens, fixed once created (designs refer to them). */
export const catalogueSlug = z
  .string()
  .trim()
  .min(2, 'Use at least 2 characters')
  .max(80, 'Use at most 80 characters')
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'Use lower-case letters and digits joined by hyphens, like “daisy-chain”');

export const catalogueName = z.string().trim().min(1, 'Give it a name').max(120, 'Keep the name under 120 characters');

/** `#RRGGBB`, stored in capitals (the schema's check compares bytes). */
export const hexColour = z
  .string()
  .trim()
  .regex(/^#[0-9A-Fa-f]{6}$/, 'Write the colour as # and six hex digits, like #F4A6C0')
  .transform((hex) => hex.toUpperCase());

/**
 * The smallest length the catalogue stores: its columns keep hundredths of a millimetre, so anything shorter would
 * be stored as 0 and break the table's "more than 0" checks.
 */
export const MIN_STORED_LENGTH_MM = 0.01;

/** A length on the garment or in the hoop, mm: at least a hundredth of a millimetre, as the columns store it. */
export const lengthMm = (label: string, maxMm = 2000) =>
  z
    .number({ error: `Enter ${label} in millimetres` })
    .positive(`${label[0]!.toUpperCase()}${label.slice(1)} must be more than 0 mm`)
    .min(
      MIN_STORED_LENGTH_MM,
      `${label[0]!.toUpperCase()}${label.slice(1)} must be at least ${MIN_STORED_LENGTH_MM} mm`,
    )
    .max(maxMm, `Keep ${label} at or under ${maxMm} mm`);

export const sortOrder = z.number().int('Use a whole number').min(0).max(100_000).optional();

/** Path parameter `:id` of a catalogue row. */
export const catalogueIdParams = z.object({ id: z.coerce.number().int().positive('Use a catalogue id') });

/** A catalogue row's id and whether customers can choose it, as answered after create, edit, retire and reactivate. */
export const catalogueRowRef = z.object({ id: z.number().int(), isActive: z.boolean() });
export type CatalogueRowRef = z.infer<typeof catalogueRowRef>;
