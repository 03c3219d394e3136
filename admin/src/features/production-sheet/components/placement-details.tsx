import type { SheetPlacement } from '@server/contracts/production-sheet.ts';
import { formatLength } from '@ui/format.ts';
import { ThreadSequence } from './thread-sequence.tsx';

/**
 * One placement on the sheet: its size and counts, its stitching step, where it goes on the garment, the
 * lettering's font and letter height, a warning when it lies in a border hooping, the studio's stitch file and its
 * threads. The PDF prints the same fields.
 */
export function PlacementDetails({ placement }: { placement: SheetPlacement }) {
  const headingId = `placement-${placement.id}`;
  return (
    <article aria-labelledby={headingId} className="grid content-start gap-2">
      <h3 id={headingId} className="font-semibold">
        <span className="mr-2 inline-block rounded-full bg-walnut-900 px-2 text-sm text-linen-100">
          <span className="sr-only">Stitching step </span>
          {placement.sewOrder}
        </span>
        {placement.label}
      </h3>
      <p className="text-sm text-walnut-500">
        {formatLength(placement.widthMm)} × {formatLength(placement.heightMm)} ·{' '}
        {placement.stitches.toLocaleString('en-US')} stitches · {placement.colourChanges} colour changes ·{' '}
        {placement.hoopings} hooping{placement.hoopings === 1 ? '' : 's'}
        {placement.hoop && <> · {placement.hoop.name}</>}
      </p>
      <dl className="grid gap-1 text-sm">
        {placement.position && (
          <div>
            <dt className="inline font-medium">Where: </dt>
            <dd className="inline">{placement.position.words}</dd>
          </div>
        )}
        {placement.lettering && (
          <div>
            <dt className="inline font-medium">Lettering: </dt>
            <dd className="inline">{placement.lettering.words}</dd>
          </div>
        )}
        {placement.stitchFileName && (
          <div>
            <dt className="inline font-medium">Stitch file: </dt>
            <dd className="inline break-all font-mono">{placement.stitchFileName}</dd>
          </div>
        )}
      </dl>
      {placement.hoopingWarning && (
        <p role="note" className="rounded-lg border border-saffron-500 bg-saffron-100 p-2 text-sm">
          <strong className="font-semibold">Border hooping {placement.hoopingWarning.hoopingOrder}: </strong>
          {placement.hoopingWarning.text}
        </p>
      )}
      {placement.kind === 'artwork' && placement.threads.length > 0 && (
        <p className="text-sm text-walnut-500">
          The palette’s nearest threads to the artwork’s own colours; check them against the stitch file.
        </p>
      )}
      <ThreadSequence threads={placement.threads} />
    </article>
  );
}
