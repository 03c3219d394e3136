// The shipped lettering fonts, loaded only where lettering is shown.
import '@fontsource/pacifico/400.css';
import '@fontsource/fredoka/400.css';
import '@fontsource/playfair-display/400.css';
import '@fontsource/great-vibes/400.css';
import type { ReactNode } from 'react';
import type { StudioFont } from '@server/contracts/admin-catalogue.ts';

export function LetteringSamples({
  fonts,
  renderActions,
}: {
  fonts: StudioFont[];
  renderActions?: (font: StudioFont) => ReactNode;
}) {
  return (
    <ul className="grid gap-3 sm:grid-cols-2">
      {fonts.map((font) => (
        <li
          key={font.id}
          className={`rounded-lg border border-linen-200 bg-white p-4 ${font.isActive ? '' : 'opacity-55'}`}
        >
          <p className="text-3xl text-walnut-900" style={{ fontFamily: `"${font.fontFamily}", cursive` }}>
            Amelia Rose
          </p>
          <p className="mt-2 text-sm">
            <span className="font-medium">{font.name}</span>
            <span className="text-walnut-500">
              {' '}
              · letters {font.minHeightMm}–{font.maxHeightMm} mm tall{font.isActive ? '' : ' · hidden from customers'}
            </span>
          </p>
          {renderActions && <div className="mt-2 flex flex-wrap gap-2">{renderActions(font)}</div>}
        </li>
      ))}
    </ul>
  );
}
