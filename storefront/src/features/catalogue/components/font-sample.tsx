import type { LetteringFontSummary } from '@server/contracts/catalogue.ts';
import { formatLength } from '@ui/format.ts';

/**
 * A lettering font shown in its own face. The faces are declared with the app's fonts but a browser fetches a
 * face only when text is set in it, so they download where lettering is shown and nowhere else.
 */
export function FontSample({ font, sample }: { font: LetteringFontSummary; sample: string }) {
  return (
    <li className="rounded-card border border-linen-200 bg-white p-4">
      <h3 className="text-sm font-medium text-walnut-500">{font.name}</h3>
      <p
        className="mt-1 truncate text-4xl leading-snug text-walnut-900"
        style={{ fontFamily: `"${font.fontFamily}", cursive` }}
        data-font-family={font.fontFamily}
      >
        {sample}
      </p>
      <p className="mt-2 text-xs text-walnut-500">
        Letters from {formatLength(font.minHeightMm)} to {formatLength(font.maxHeightMm)} tall (the height of a capital
        H)
      </p>
    </li>
  );
}
