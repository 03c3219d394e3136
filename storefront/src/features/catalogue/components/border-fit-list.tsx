import type { ReactNode } from 'react';
import type { GarmentSummary, MotifSummary } from '@server/contracts/catalogue.ts';
// Straight from its module: the engine's entry also registers colour spaces at load, which this page does not need.
import { fitMotifBorder } from '@server/engine/fit-border.ts';
import { formatLength } from '@ui/format.ts';
import { HemBorderStrip } from './hem-border-strip.tsx';

type Size = GarmentSummary['sizes'][number];

/**
 * For one size, how each border motif would run all the way round the hem: the number of repeats, the size each is
 * stitched at, and a drawing. The figures come from the same engine the studio plans production with; prices are
 * always quoted by the server.
 */
export function BorderFitList({
  motifs,
  size,
  fabricHex,
  priceOf,
}: {
  motifs: MotifSummary[];
  size: Size;
  fabricHex: string | undefined;
  /** The page supplies each border's price, which always comes from the server. */
  priceOf: (motif: MotifSummary) => ReactNode;
}) {
  const circumferenceMm = size.hemCircumferenceMm;
  if (circumferenceMm === null) return null;
  return (
    <ul className="grid gap-4">
      {motifs.map((motif) => {
        const fit = fitMotifBorder(motif, { runLengthMm: circumferenceMm, closed: true });
        return (
          <li key={motif.id} className="rounded-card border border-linen-200 bg-white p-4">
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <h3 className="font-medium">{motif.name}</h3>
              {fit.ok ? (
                <p className="text-sm text-walnut-700">
                  {fit.count} repeats, each {formatLength(fit.repeatWidthMm)} ({Math.round(fit.scale * 1000) / 10} % of
                  its drawn size)
                </p>
              ) : (
                <p className="text-sm text-madder-700">Doesn't fit this size: {fit.reason}</p>
              )}
            </div>
            {fit.ok && (
              <div className="mt-3">
                <HemBorderStrip
                  motif={motif}
                  fit={fit}
                  circumferenceMm={circumferenceMm}
                  frontMm={size.hemFrontMm}
                  fabricHex={fabricHex}
                />
                <div className="mt-3">{priceOf(motif)}</div>
              </div>
            )}
          </li>
        );
      })}
    </ul>
  );
}
