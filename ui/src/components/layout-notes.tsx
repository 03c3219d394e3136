import type { GuidanceMessageSummary } from '@server/contracts/guidance.ts';

/**
 * The server's layout notes for an order's design: where two placements would be stitched on top of each other.
 * Shown beside the proof, for the customer before approving it and for the studio before sending it; nothing when
 * the design has none.
 */
export function LayoutNotes({
  notes,
  heading = 'Overlapping embroidery',
  advice,
  className = '',
}: {
  notes: readonly GuidanceMessageSummary[] | undefined;
  heading?: string;
  /** What this reader can do about it, in their words. */
  advice?: string;
  className?: string;
}) {
  if (!notes || notes.length === 0) return null;
  return (
    <section aria-label={heading} className={`space-y-2 text-sm ${className}`}>
      <h3 className="font-semibold">{heading}</h3>
      <ul className="space-y-2">
        {notes.map((note, index) => (
          <li key={`${note.code}-${index}`} className="rounded-lg border border-saffron-500/50 bg-saffron-100 p-3">
            <p className="font-medium">
              <span className="sr-only">Please take care: </span>
              {note.title}
            </p>
            <p className="mt-0.5 text-walnut-700">{note.text}</p>
          </li>
        ))}
      </ul>
      {advice && <p className="text-xs text-walnut-700">{advice}</p>}
    </section>
  );
}
