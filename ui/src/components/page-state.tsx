import type { ReactNode } from 'react';

/** A calm loading placeholder that screen readers announce. */
export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <div role="status" aria-live="polite" className="flex items-center gap-3 py-10 text-walnut-500">
      <span className="inline-block h-5 w-5 animate-spin rounded-full border-2 border-linen-300 border-t-madder-500" />
      {label}
    </div>
  );
}

/** An error shown where the content would have been, with a way to try again. */
export function ErrorNotice({ message, onRetry }: { message: string; onRetry?: () => void }) {
  return (
    <div role="alert" className="rounded-card border border-madder-500/40 bg-madder-50 p-5 text-madder-700">
      <p>{message}</p>
      {onRetry && (
        <button
          type="button"
          onClick={onRetry}
          className="mt-3 rounded-full bg-madder-600 px-4 py-2 text-sm font-medium text-white hover:bg-madder-700"
        >
          Try again
        </button>
      )}
    </div>
  );
}

/** Shown when a list has nothing in it yet: says why, and what to do next. */
export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded-card border-2 border-dashed border-linen-300 p-8 text-center text-walnut-700">
      <p className="font-medium">{title}</p>
      {children && <div className="mt-2 text-sm text-walnut-500">{children}</div>}
    </div>
  );
}
