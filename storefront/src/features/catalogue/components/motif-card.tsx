import type { MotifSummary } from '@server/contracts/catalogue.ts';
import { formatLength } from '@ui/format.ts';
import { svgDataUrl } from '@ui/svg-data-url.ts';

const kindLabels: Record<MotifSummary['kind'], string> = { border: 'Border repeat', single: 'Single motif' };

/** A catalogue motif: its drawing, its finished size at 100 % and how far it can be resized, and its stitch count. */
export function MotifCard({ motif }: { motif: MotifSummary }) {
  const src = svgDataUrl(motif.svg);
  return (
    <li className="flex flex-col overflow-hidden rounded-card border border-linen-200 bg-white">
      <div className="flex h-36 items-center justify-center bg-linen-100 p-4">
        <img src={src} alt="" className="max-h-full max-w-full" />
      </div>
      <div className="flex flex-1 flex-col gap-2 p-4">
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h3 className="font-semibold">{motif.name}</h3>
          <span className="rounded-full bg-sage-50 px-2.5 py-0.5 text-xs font-medium text-sage-700">
            {kindLabels[motif.kind]}
          </span>
        </div>
        <dl className="grid gap-1 text-sm text-walnut-700">
          <div>
            <dt className="inline text-walnut-500">{motif.kind === 'border' ? 'Each repeat: ' : 'Finished size: '}</dt>
            <dd className="inline">
              {formatLength(motif.widthMm)} wide × {formatLength(motif.heightMm)} tall
            </dd>
          </div>
          <div>
            <dt className="inline text-walnut-500">Can be sized: </dt>
            <dd className="inline">
              {motif.minScalePct}–{motif.maxScalePct} % of that
            </dd>
          </div>
          <div>
            <dt className="inline text-walnut-500">Stitches: </dt>
            <dd className="inline">
              about {motif.stitchCount.toLocaleString('en-US')} in {motif.colourCount} thread{' '}
              {motif.colourCount === 1 ? 'colour' : 'colours'}
            </dd>
          </div>
        </dl>
      </div>
    </li>
  );
}
