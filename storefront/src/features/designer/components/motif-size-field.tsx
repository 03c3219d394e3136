import { useId } from 'react';
import type { HoopSummary, MotifSummary } from '@server/contracts/catalogue.ts';
import { formatLength } from '@ui/format.ts';
import { largestHoop } from '../model/hoop-limit.ts';
import { motifScaleRange } from '../model/motif-rules.ts';

/** A motif's size as a share of its digitized size, within the limits its stitch file and the largest hoop allow. */
export function MotifSizeField({
  motif,
  hoops,
  value,
  onChange,
}: {
  motif: MotifSummary;
  hoops: readonly HoopSummary[];
  value: number;
  onChange: (scalePct: number) => void;
}) {
  const id = useId();
  const { minPct, maxPct, isHoopLimited } = motifScaleRange(motif, hoops);
  const widthMm = (motif.widthMm * value) / 100;
  const heightMm = (motif.heightMm * value) / 100;
  const hoop = largestHoop(hoops);
  return (
    <div>
      <label htmlFor={id} className="flex items-baseline justify-between gap-2 text-sm font-medium">
        <span>Size</span>
        <span className="font-normal text-walnut-700">
          {value} % · {formatLength(widthMm)} wide
        </span>
      </label>
      <input
        id={id}
        type="range"
        min={minPct}
        max={maxPct}
        step={1}
        value={value}
        aria-valuetext={`${value} %, ${formatLength(widthMm)} wide`}
        onChange={(event) => onChange(Number(event.target.value))}
        className="mt-2 h-11 w-full accent-madder-600"
      />
      <p className="text-xs text-walnut-500">
        {formatLength(widthMm)} wide, {formatLength(heightMm)} tall. A stitched design only resizes a little before it
        looks wrong, so this one goes from {minPct} % to {maxPct} %
        {isHoopLimited && hoop
          ? `, the most that fits our largest hoop's ${hoop.fieldWidthMm} × ${hoop.fieldHeightMm} mm sewing field with ${hoop.clearanceMm} mm kept clear at each edge`
          : ''}
        .
      </p>
    </div>
  );
}
