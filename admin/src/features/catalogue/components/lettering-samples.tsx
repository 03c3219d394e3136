// The shipped lettering fonts, loaded only where lettering is shown.
import '@fontsource/pacifico/400.css';
import '@fontsource/fredoka/400.css';
import '@fontsource/playfair-display/400.css';
import '@fontsource/great-vibes/400.css';
import type { StudioFont } from '@server/contracts/admin-catalog.ts';

export function LetteringSamples({ fonts }: { fonts: StudioFont[] }) {
  return (
    <ul className="grid gap-3 sm:grid-cols-2">
      {fonts.map((font) => (
        <li key={font.id} className={`rounded-lg border border-linen-200 bg-white p-4 ${font.isActive ? '' : 'opacity-55'}`}>
          <p className="text-3xl text-walnut-900" style={{ fontFamily: `"${font.fontFamily}", cursive` }}>Amelia Rose</p>
          <p className="mt-2 text-sm">
            <span className="font-medium">{font.name}</span>
            <span className="text-walnut-500"> · letters {font.minHeightMm}–{font.maxHeightMm} mm tall{font.isActive ? '' : ' · hidden from customers'}</span>
          </p>
        </li>
      ))}
    </ul>
  );
}
