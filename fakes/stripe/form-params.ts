import { z } from 'zod';
import { invalidRequest } from './api-error.ts';

// Form-encoded bodies carry every value as a string; these parse the shapes the Stripe API accepts.
export const formInteger = z
  .string()
  .regex(/^-?\d+$/, 'Invalid integer')
  .transform(Number)
  .pipe(z.number().int().safe());

export const positiveAmount = formInteger.pipe(z.number().min(1, 'must be at least 1'));

export const currency = z
  .string()
  .regex(/^[a-zA-Z]{3}$/, 'Invalid currency')
  .transform((code) => code.toLowerCase());

export const httpUrl = z
  .string()
  .max(5000)
  .refine((value) => URL.canParse(value) && ['http:', 'https:'].includes(new URL(value).protocol), 'Not a valid URL');

/** Stripe's metadata limits: 50 keys, keys up to 40 characters, values up to 500. Empty values unset a key. */
export const metadata = z
  .record(z.string().max(40), z.string().max(500))
  .refine((entries) => Object.keys(entries).length <= 50, 'at most 50 keys')
  .transform((entries) => Object.fromEntries(Object.entries(entries).filter(([, value]) => value !== '')));

export const expand = z.array(z.string()).optional();

function bracketPath(path: readonly PropertyKey[]): string {
  return path.map((segment, index) => (index === 0 ? String(segment) : `[${String(segment)}]`)).join('');
}

function valueAt(input: unknown, path: readonly PropertyKey[]): unknown {
  return path.reduce<unknown>((value, key) => (value as Record<PropertyKey, unknown> | undefined)?.[key], input);
}

/**
 * Validates request parameters. The first problem is reported the way Stripe reports it: `param` in bracket
 * notation and `parameter_missing` for an absent required value. Parameters the fake does not model are ignored.
 */
export function parseParams<T extends z.ZodType>(schema: T, input: unknown): z.output<T> {
  const parsed = schema.safeParse(input ?? {});
  if (parsed.success) return parsed.data;
  const issue = parsed.error.issues[0];
  const param = bracketPath(issue.path);
  if (issue.path.length > 0 && valueAt(input, issue.path) === undefined) {
    throw invalidRequest(`Missing required param: ${param}.`, { code: 'parameter_missing', param });
  }
  throw invalidRequest(`Invalid ${param || 'request'}: ${issue.message}`, param ? { param } : {});
}

/** Applies `expand[]`, refusing fields that cannot be expanded as Stripe does. */
export function expandFields<T extends object>(
  object: T,
  fields: readonly string[] | undefined,
  expanders: Record<string, (object: T) => unknown>,
): T {
  const expanded = { ...object } as Record<string, unknown>;
  for (const field of fields ?? []) {
    const expander = Object.hasOwn(expanders, field) ? expanders[field] : undefined;
    if (!expander) throw invalidRequest(`This property cannot be expanded (${field}).`, { param: 'expand' });
    expanded[field] = expander(object);
  }
  return expanded as T;
}
