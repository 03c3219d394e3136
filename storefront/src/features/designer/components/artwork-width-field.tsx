import { useId, useState } from 'react';
import { formatLength } from '@ui/format.ts';

/** The artwork's width on the garment, mm, by slider or typed; its height follows in proportion. */
export function ArtworkWidthField({
  value,
  heightMm,
  range,
  limitNote,
  onChange,
}: {
  value: number;
  heightMm: number;
  range: { minMm: number; maxMm: number };
  limitNote: string;
  onChange: (widthMm: number) => void;
}) {
  const sliderId = useId();
  const numberId = useId();
  // A typed width is taken when the field is left or Enter is pressed, so "1" on the way to "120" is not clamped.
  const [typed, setTyped] = useState<string>();
  const commit = () => {
    const width = Number(typed);
    if (typed !== undefined && typed.trim() !== '' && Number.isFinite(width)) onChange(width);
    setTyped(undefined);
  };
  return (
    <div>
      <label htmlFor={sliderId} className="flex items-baseline justify-between gap-2 text-sm font-medium">
        <span>Width</span>
        <span className="font-normal text-walnut-700">{formatLength(value)}</span>
      </label>
      <input
        id={sliderId}
        type="range"
        min={range.minMm}
        max={range.maxMm}
        step={0.5}
        value={value}
        aria-valuetext={`${formatLength(value)} wide`}
        onChange={(event) => onChange(Number(event.target.value))}
        className="mt-2 h-11 w-full accent-madder-600"
      />
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <label htmlFor={numberId}>Width in mm</label>
        <input
          id={numberId}
          type="number"
          inputMode="decimal"
          min={range.minMm}
          max={range.maxMm}
          step={0.5}
          value={typed ?? value}
          onChange={(event) => setTyped(event.target.value)}
          onBlur={commit}
          onKeyDown={(event) => {
            if (event.key === 'Enter') commit();
          }}
          className="min-h-11 w-24 rounded-lg border border-linen-300 bg-white px-3"
        />
      </div>
      <p className="mt-1 text-xs text-walnut-500">
        {formatLength(value)} wide, {formatLength(heightMm)} tall; from {range.minMm} to {range.maxMm} mm here.{' '}
        {limitNote}
      </p>
    </div>
  );
}
