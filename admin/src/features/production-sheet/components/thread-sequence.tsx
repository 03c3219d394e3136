import type { SheetPlacement } from '@server/contracts/production-sheet.ts';

/** The threads in stitching order, each with a swatch of its colour. */
export function ThreadSequence({ threads }: { threads: SheetPlacement['threads'] }) {
  if (threads.length === 0)
    return (
      <p className="text-sm text-walnut-500">A photo or scan of the customer’s: choose its threads when digitizing.</p>
    );
  return (
    <ol className="grid gap-1.5 text-sm">
      {threads.map((thread) => (
        <li key={`${thread.order}-${thread.code}`} className="flex items-center gap-3">
          <span className="w-5 text-right tabular-nums text-walnut-500">{thread.order}.</span>
          <span
            aria-hidden="true"
            className="inline-block h-5 w-9 rounded border border-walnut-700 print-colour"
            style={{ backgroundColor: thread.hex }}
          />
          <span>
            <strong className="font-semibold">{thread.code}</strong> {thread.name}{' '}
            <span className="text-walnut-500">({thread.hex})</span>
          </span>
        </li>
      ))}
    </ol>
  );
}
