import { useId } from 'react';
import type { LetteringFontSummary } from '@server/contracts/catalogue.ts';
import { formatLength } from '@ui/format.ts';

/** How tall the capital letters are, within what the font sews cleanly at, in mm with inches alongside. */
export function LetterHeightField({
  font,
  value,
  onChange,
}: {
  font: LetteringFontSummary;
  value: number;
  onChange: (heightMm: number) => void;
}) {
  const id = useId();
  return (
    <div>
      <label htmlFor={id} className="flex items-baseline justify-between gap-2 text-sm font-medium">
        <span>Letter height</span>
        <span className="font-normal text-walnut-700">{formatLength(value)}</span>
      </label>
      <input
        id={id}
        type="range"
        min={font.minHeightMm}
        max={font.maxHeightMm}
        step={0.5}
        value={value}
        aria-valuetext={formatLength(value)}
        onChange={(event) => onChange(Number(event.target.value))}
        className="mt-2 h-11 w-full accent-madder-600"
      />
      <p className="text-xs text-walnut-500">
        The height of a capital letter. {font.name} sews cleanly from {formatLength(font.minHeightMm)} to{' '}
        {formatLength(font.maxHeightMm)}.
      </p>
    </div>
  );
}
