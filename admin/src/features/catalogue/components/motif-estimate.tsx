import type { MotifEstimate } from '@server/contracts/admin-catalogue-motifs.ts';
import { StitchMixBar, StitchMixLegend } from './stitch-mix-bar.tsx';

/** The engine's estimate for the artwork: the count, its mix as a bar, the stops, and what it could not count. */
export function MotifEstimateSummary({ estimate }: { estimate: MotifEstimate }) {
  const top = estimate.mix.run + estimate.mix.satin + estimate.mix.fill;
  return (
    <div className="grid gap-2 text-sm" data-testid="motif-estimate">
      <p>
        <span className="text-2xl font-semibold tabular-nums">{estimate.stitchCount.toLocaleString('en-US')}</span>{' '}
        stitches estimated
        <span className="text-walnut-500">
          {' '}
          ({top.toLocaleString('en-US')} on top, {estimate.underlay.toLocaleString('en-US')} underlay ·{' '}
          {estimate.colourChanges} colour change
          {estimate.colourChanges === 1 ? '' : 's'})
        </span>
      </p>
      <StitchMixBar mix={estimate.mix} />
      <StitchMixLegend />
      {estimate.notes.length > 0 && (
        <ul className="list-disc pl-5 text-xs text-walnut-500">
          {estimate.notes.map((note) => (
            <li key={note}>{note}</li>
          ))}
        </ul>
      )}
    </div>
  );
}
