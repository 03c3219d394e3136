import type { ReactNode } from 'react';
import { Button } from '@ui/components/button.tsx';

/** One section of the catalogue page: a heading to jump to, a note, the add button and its list. */
export function CataloguePanel({
  id,
  title,
  note,
  addLabel,
  onAdd,
  children,
}: {
  id: string;
  title: string;
  note?: string;
  addLabel?: string;
  onAdd?: () => void;
  children: ReactNode;
}) {
  return (
    <section
      id={id}
      aria-labelledby={`${id}-title`}
      className="min-w-0 scroll-mt-4 rounded-card border border-linen-200 bg-white p-4 sm:p-5"
    >
      <div className="mb-3 flex flex-wrap items-start justify-between gap-3">
        <div>
          <h2 id={`${id}-title`} className="text-lg font-semibold">
            {title}
          </h2>
          {note && <p className="text-sm text-walnut-500">{note}</p>}
        </div>
        {onAdd && <Button onClick={onAdd}>{addLabel}</Button>}
      </div>
      {children}
    </section>
  );
}
