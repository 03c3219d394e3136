import type { QuotePreviewResponse } from '@server/contracts/quotes.ts';
import { SafetyCautions, severityLook } from '../../../components/safety-cautions.tsx';

const counted = (count: number, one: string, many: string) =>
  `${count.toLocaleString('en-US')} ${count === 1 ? one : many}`;

/**
 * The hoopings and thread changes in all, in the words the price's lines use: each part's first hooping is in its
 * own price, so only the rest are "extra"; thread changes count the ones between parts too.
 */
function StitchingTotals({
  stitching,
  placements,
}: {
  stitching: NonNullable<QuotePreviewResponse['stitching']>;
  placements: number;
}) {
  return (
    <p className="mt-1 text-walnut-700" aria-label="Hoopings and thread changes in all">
      In all: {counted(stitching.hoopings, 'hooping', 'hoopings')}, of which{' '}
      {counted(stitching.extraHoopings, 'is extra', 'are extra')} (
      {placements === 1 ? 'the first is included' : `the first of each of the ${placements} parts is included`});{' '}
      {counted(stitching.colourChanges, 'thread change', 'thread changes')}
      {stitching.colourChangesBetweenPlacements > 0 &&
        `, ${stitching.colourChangesBetweenPlacements} of them between parts, in the order they are stitched`}
      .
    </p>
  );
}

/**
 * How the design will be made and what to know about it, in plain words: the trade words "hooping" and
 * "stabilizer" are explained where they first appear; the server's stabilizer advice follows as notes, then its
 * safety notes for the garment, size and design.
 */
export function MakingNotes({ preview }: { preview: QuotePreviewResponse }) {
  const notes = preview.stabilizer.messages;
  return (
    <div className="mt-4 space-y-3 text-sm">
      <div>
        <h3 className="font-medium">How it will be stitched</h3>
        <ul className="mt-1 space-y-0.5 text-walnut-700">
          {preview.placements.map((placement) => (
            <li key={placement.id}>
              {placement.label}:{' '}
              {placement.isPriceProvisional
                ? 'stitches counted once the studio has digitized it'
                : `about ${counted(placement.stitches, 'stitch', 'stitches')}`}
              , {counted(placement.hoopings, 'hooping', 'hoopings')}
            </li>
          ))}
        </ul>
        {preview.stitching && <StitchingTotals stitching={preview.stitching} placements={preview.placements.length} />}
        <p className="mt-2 text-xs text-walnut-500">
          <strong className="font-medium">Hooping</strong> is how each part is stitched: the fabric is held taut in a
          ring (the hoop) on the machine. A border is stitched one hooping at a time, moving the hoop along the hem.{' '}
          <strong className="font-medium">Stabilizer</strong> is a thin backing stitched under the fabric so the
          embroidery lies flat and keeps its shape; we choose it for your fabric and design.
        </p>
      </div>
      {notes.length > 0 && (
        <ul className="space-y-2" aria-label="Notes on your garment">
          {notes.map((note) => (
            <li key={note.code} className={`rounded-lg border p-3 ${severityLook[note.severity]}`}>
              <p className="font-medium">{note.title}</p>
              <p className="mt-0.5 text-walnut-700">{note.text}</p>
            </li>
          ))}
        </ul>
      )}
      <SafetyCautions cautions={preview.cautions} heading="Safety notes for this size" />
    </div>
  );
}
