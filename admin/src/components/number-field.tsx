import { useId, type ReactNode } from 'react';

interface NumberFieldProps {
  label: ReactNode;
  value: string;
  onChange: (value: string) => void;
  /** Shown before the input: "$". */
  prefix?: string;
  /** Shown after the input: "%", "min", "per 1,000 stitches". */
  suffix?: string;
  hint?: string;
  /** The server's message for this field, shown under it and tied to it for screen readers. */
  error?: string;
  isReadOnly?: boolean;
  step?: string;
  className?: string;
}

/** A labelled decimal input with its unit beside it and the server's error in place. */
export function NumberField({
  label,
  value,
  onChange,
  prefix,
  suffix,
  hint,
  error,
  isReadOnly,
  step = '0.01',
  className = '',
}: NumberFieldProps) {
  const id = useId();
  const describedBy = [hint && `${id}-hint`, error && `${id}-error`].filter(Boolean).join(' ') || undefined;
  return (
    <div className={`grid gap-1 ${className}`}>
      <label htmlFor={id} className="text-sm font-medium text-walnut-700">
        {label}
      </label>
      <div
        className={`flex items-center gap-1.5 rounded-lg border bg-white px-2.5 ${error ? 'border-madder-500' : 'border-linen-300'} ${isReadOnly ? 'bg-linen-50' : ''}`}
      >
        {prefix && <span className="text-sm text-walnut-500">{prefix}</span>}
        <input
          id={id}
          type="number"
          inputMode="decimal"
          step={step}
          value={value}
          readOnly={isReadOnly}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
          onChange={(event) => onChange(event.target.value)}
          className="min-h-10 w-full min-w-0 bg-transparent py-1.5 tabular-nums outline-none"
        />
        {suffix && <span className="whitespace-nowrap text-sm text-walnut-500">{suffix}</span>}
      </div>
      {hint && (
        <p id={`${id}-hint`} className="text-xs text-walnut-500">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="text-sm text-madder-700">
          {error}
        </p>
      )}
    </div>
  );
}
