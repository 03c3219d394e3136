import type { ReactNode } from 'react';
import type { StudioMotif, StudioThread } from '@server/contracts/admin-catalogue.ts';
import { formatLength } from '@ui/format.ts';
import { StitchMixBar, StitchMixLegend } from './stitch-mix-bar.tsx';
import { svgDataUrl } from '@ui/svg-data-url.ts';

/** The studio's motifs with the figures the quotes and the production sheet are built from. */
export function MotifTable({
  motifs,
  threads,
  renderActions,
}: {
  motifs: StudioMotif[];
  threads: StudioThread[];
  renderActions?: (motif: StudioMotif) => ReactNode;
}) {
  const threadByCode = new Map(threads.map((t) => [t.code, t]));
  return (
    <div>
      <StitchMixLegend />
      <div className="relative mt-2 overflow-x-auto">
        <table className="w-full min-w-[52rem] text-left text-sm">
          <thead className="text-walnut-500">
            <tr>
              <th className="py-1.5 font-medium">Motif</th>
              <th className="py-1.5 font-medium">Use</th>
              <th className="py-1.5 font-medium">Size at 100 %</th>
              <th className="py-1.5 font-medium">Resize within</th>
              <th className="py-1.5 text-right font-medium">Stitches</th>
              <th className="py-1.5 pl-4 font-medium">Stitch mix</th>
              <th className="py-1.5 font-medium">Threads in order</th>
              {renderActions && (
                <th className="py-1.5 font-medium">
                  <span className="sr-only">Actions</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody>
            {motifs.map((motif) => (
              <tr key={motif.id} className={`border-t border-linen-200 ${motif.isActive ? '' : 'opacity-55'}`}>
                <td className="py-2">
                  <span className="flex items-center gap-3">
                    <img
                      src={svgDataUrl(motif.svg)}
                      alt=""
                      className="h-10 w-16 rounded bg-linen-100 object-contain p-0.5"
                    />
                    <span className="font-medium">
                      {motif.name}
                      {motif.isActive ? '' : ' (hidden)'}
                    </span>
                  </span>
                </td>
                <td className="py-2">{motif.kind === 'border' ? 'Hem border' : 'Single'}</td>
                <td className="py-2 whitespace-nowrap">
                  {formatLength(motif.widthMm)} × {Math.round(motif.heightMm)} mm
                </td>
                <td className="py-2">
                  {motif.minScalePct}–{motif.maxScalePct} %
                </td>
                <td className="py-2 text-right tabular-nums">
                  {motif.stitchCount.toLocaleString('en-US')}
                  <span className="block text-xs text-walnut-500">
                    {motif.stitchCountSource === 'measured' ? 'measured' : 'estimated'}
                  </span>
                </td>
                <td className="py-2 pl-4">
                  <StitchMixBar mix={motif.mix} />
                </td>
                <td className="py-2">
                  <span className="flex gap-1">
                    {motif.threadCodes.map((code, index) => {
                      const thread = threadByCode.get(code);
                      return (
                        <span
                          key={`${code}-${index}`}
                          title={thread ? `${index + 1}. ${thread.name} (${code})` : code}
                          className="h-5 w-5 rounded-full border border-walnut-900/20"
                          style={{ backgroundColor: thread?.hex ?? 'transparent' }}
                        />
                      );
                    })}
                  </span>
                </td>
                {renderActions && <td className="py-2 pl-2 align-top">{renderActions(motif)}</td>}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
