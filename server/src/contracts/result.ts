import type { ErrorKind } from './errors.ts';

/** What a service returns: the value, or an expected failure the route maps to a status. Bugs are thrown instead. */
export type Result<T> =
  | { ok: true; value: T }
  | {
      ok: false;
      error: { kind: ErrorKind; message: string; fields?: Record<string, string>; details?: Record<string, unknown> };
    };

export const ok = <T>(value: T): Result<T> => ({ ok: true, value });
export const failure = (
  kind: ErrorKind,
  message: string,
  fields?: Record<string, string>,
  details?: Record<string, unknown>,
): Result<never> => ({
  ok: false,
  error: { kind, message, ...(fields ? { fields } : {}), ...(details ? { details } : {}) },
});
