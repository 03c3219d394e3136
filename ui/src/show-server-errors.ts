import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api-client.ts';

/**
 * Puts the server's answer where it belongs: each field message beside its field (the server's dot paths are the
 * form's own field names), and anything else as the form's general error.
 */
export function showServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly string[],
): void {
  const fields = error instanceof ApiError ? (error.fields ?? {}) : {};
  let isShownBesideAField = false;
  for (const [path, message] of Object.entries(fields)) {
    if (fieldNames.some((name) => path === name || path.startsWith(`${name}.`))) {
      setError(path as Path<T>, { type: 'server', message });
      isShownBesideAField = true;
    }
  }
  const message = error instanceof Error ? error.message : 'Something went wrong. Please try again.';
  if (!isShownBesideAField) setError('root.server' as Path<T>, { type: 'server', message });
}
