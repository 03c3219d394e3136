import type { QuotePreviewResponse } from '@server/contracts/quotes.ts';

const counted = (count: number, one: string, many: string) =>
  `${count.toLocaleString('en-US')} ${count === 1 ? one : many}`;

/** Notes addressed to the studio rather than the parent; the shop's footer carries its own word on local rules. */
const studioOnlyNotes = new Set(['caution.local-rules']);

const severityLook = {
  info: 'border-sage-500/40 bg-sage-50',
  caution: 'border-saffron-500/50 bg-saffron-100',
  warning: 'border-madder-500/50 bg-madder-50',
} as const;

/**
 * How the design will be made and what to know about it, in plain words: the trade words "hooping" and
 * "stabilizer" are explained where they first appear, and the server's advice and cautions follow as notes.
 */
export function MakingNotes({ preview }: { preview: QuotePreviewResponse }) {
  const notes = [...preview.stabilizer.messages, ...preview.cautions].filter((note) => !studioOnlyNotes.has(note.code));
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
    </div>
  );
}
