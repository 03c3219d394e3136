import { useId, type ReactElement, type ReactNode } from 'react';
import { cloneElement } from 'react';
import type { FieldValues, UseFormSetError } from 'react-hook-form';
import { showServerErrors } from '@ui/show-server-errors.ts';

export const inputClassName =
  'min-h-10 w-full rounded-lg border border-linen-300 bg-white px-3 py-2 text-sm text-walnut-900 focus:border-madder-500 focus:outline-2 focus:outline-madder-500/30 aria-[invalid=true]:border-madder-600';

/** A compact button for actions on a row of a list. */
export const smallButtonClassName =
  'min-h-9 rounded-full border border-linen-300 bg-white px-3 text-sm hover:bg-linen-100 disabled:opacity-60';

/**
 * A labelled form control with its hint and its error beneath it. The control gets its id, `aria-invalid` and
 * `aria-describedby` from here, so screen readers read the error with the field.
 */
export function Field({
  label,
  error,
  hint,
  children,
  className = '',
}: {
  label: string;
  error?: string;
  hint?: ReactNode;
  children: ReactElement<Record<string, unknown>>;
  className?: string;
}) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint ? hintId : '', error ? errorId : ''].filter(Boolean).join(' ') || undefined;
  return (
    <div className={`grid content-start gap-1 ${className}`}>
      <label htmlFor={id} className="text-sm font-medium text-walnut-700">
        {label}
      </label>
      {cloneElement(children, { id, 'aria-invalid': error ? true : undefined, 'aria-describedby': describedBy })}
      {hint && (
        <p id={hintId} className="text-xs text-walnut-500">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="text-sm text-madder-700">
          {error}
        </p>
      )}
    </div>
  );
}

/** A number input's value for the form: an empty box is undefined (so the schema asks for it), else the number. */
export const asNumber = (value: unknown) =>
  value === '' || value === null || value === undefined ? undefined : Number(value);
/** As asNumber, for lengths that may be left out on purpose: an empty box is null. */
export const asNumberOrNull = (value: unknown) =>
  value === '' || value === null || value === undefined ? null : Number(value);

/** The form's general error, announced when it appears. */
export function FormError({ message }: { message?: string }) {
  if (!message) return null;
  return (
    <p role="alert" className="rounded-lg border border-madder-500/40 bg-madder-50 px-3 py-2 text-sm text-madder-700">
      {message}
    </p>
  );
}

/** "Daisy chain" → "daisy-chain": a suggestion for a new row's short name. */
export function slugFrom(name: string): string {
  return name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 80);
}

/** Saves, then closes the form; a refusal is shown on the form instead (see showServerErrors). */
export async function saveOrShowErrors<T extends FieldValues>(
  save: () => Promise<unknown>,
  setError: UseFormSetError<T>,
  fieldNames: readonly string[],
  onDone: () => void,
): Promise<void> {
  try {
    await save();
    onDone();
  } catch (error) {
    showServerErrors(error, setError, fieldNames);
  }
}
