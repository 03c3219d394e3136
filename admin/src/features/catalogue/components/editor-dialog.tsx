import { useEffect, useId, useRef, type ReactNode } from 'react';

/**
 * A modal form panel on the browser's own <dialog>: it traps focus, closes on Escape and returns focus to the
 * button that opened it. Its content is mounted only while it is open, so every opening starts a fresh form.
 */
export function EditorDialog({
  title,
  isOpen,
  onClose,
  children,
}: {
  title: string;
  isOpen: boolean;
  onClose: () => void;
  children: ReactNode;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (isOpen && !dialog.open) dialog.showModal();
    if (!isOpen && dialog.open) dialog.close();
  }, [isOpen]);
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onClose={onClose}
      className="m-auto max-h-[92vh] w-[min(46rem,calc(100vw-1rem))] rounded-card border border-linen-300 bg-linen-50 p-0 text-walnut-900 shadow-xl backdrop:bg-walnut-900/45"
    >
      {isOpen && (
        <div className="grid gap-4 p-4 sm:p-6">
          <div className="flex items-start justify-between gap-4">
            <h2 id={titleId} className="text-lg font-semibold">
              {title}
            </h2>
            <button
              type="button"
              onClick={onClose}
              className="min-h-10 rounded-full px-3 text-sm text-walnut-700 hover:bg-linen-200"
              aria-label="Close"
            >
              ✕
            </button>
          </div>
          {children}
        </div>
      )}
    </dialog>
  );
}
