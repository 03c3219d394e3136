import type { MotifSummary } from '@server/contracts/catalogue.ts';
import type { BorderFit } from '@server/engine/index.ts';
import { svgDataUrl } from '@ui/svg-data-url.ts';

/**
 * The hem unrolled into one line, seam to seam, with each repeat of the border drawn where it will be stitched and
 * the front panel shaded. The drawing is to scale along its length.
 */
export function HemBorderStrip({
  motif,
  fit,
  circumferenceMm,
  frontMm,
  fabricHex,
}: {
  motif: MotifSummary;
  fit: Pick<BorderFit, 'centersMm' | 'repeatWidthMm' | 'scale'>;
  circumferenceMm: number;
  frontMm: number | null;
  fabricHex: string | undefined;
}) {
  const src = svgDataUrl(motif.svg);
  const heightMm = motif.heightMm * fit.scale;
  const percent = (mm: number) => `${(mm / circumferenceMm) * 100}%`;
  return (
    <figure className="relative">
      <div
        role="img"
        aria-label={`The hem unrolled: ${fit.centersMm.length} repeats of ${motif.name} all the way round`}
        className="relative w-full overflow-hidden rounded-md bg-linen-100 ring-1 ring-walnut-900/10"
        style={{ aspectRatio: `${circumferenceMm} / ${heightMm * 1.35}`, backgroundColor: fabricHex }}
      >
        {frontMm !== null && (
          <div
            className="absolute inset-y-0 bg-white/40"
            style={{ left: percent((circumferenceMm - frontMm) / 2), width: percent(frontMm) }}
            aria-hidden="true"
          />
        )}
        {fit.centersMm.map((centerMm, index) => (
          <img
            key={index}
            src={src}
            alt=""
            className="absolute bottom-[12%]"
            style={{ left: percent(centerMm - fit.repeatWidthMm / 2), width: percent(fit.repeatWidthMm) }}
          />
        ))}
        <div className="absolute inset-x-0 bottom-0 h-px bg-walnut-500" aria-hidden="true" />
      </div>
      <figcaption className="mt-1 flex justify-between text-xs text-walnut-500">
        <span>back seam</span>
        {frontMm !== null && <span>front</span>}
        <span>back seam</span>
      </figcaption>
    </figure>
  );
}
