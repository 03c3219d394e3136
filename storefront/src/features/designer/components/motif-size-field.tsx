import { useId } from 'react';
import type { MotifSummary } from '@server/contracts/catalog.ts';
import { formatLength } from '@ui/format.ts';

/** A motif's size as a share of its digitized size, within the limits its stitch file allows. */
export function MotifSizeField({ motif, value, onChange }: { motif: MotifSummary; value: number; onChange: (scalePct: number) => void }) {
  const id = useId();
  const widthMm = (motif.widthMm * value) / 100;
  const heightMm = (motif.heightMm * value) / 100;
  return (
    <div>
      <label htmlFor={id} className="flex items-baseline justify-between gap-2 text-sm font-medium">
        <span>Size</span>
        <span className="font-normal text-walnut-700">{value} %</span>
      </label>
      <input
        id={id}
        type="range"
        min={motif.minScalePct}
        max={motif.maxScalePct}
        step={1}
        value={value}
        aria-valuetext={`${value} %, ${formatLength(widthMm)} wide`}
        onChange={(event) => onChange(Number(event.target.value))}
        className="mt-2 h-11 w-full accent-madder-600"
      />
      <p className="text-xs text-walnut-500">
        {formatLength(widthMm)} wide, {formatLength(heightMm)} tall. A stitched design only resizes a little before it
        looks wrong, so this one goes from {motif.minScalePct} % to {motif.maxScalePct} %.
      </p>
    </div>
  );
}
