import type opentype from 'opentype.js';
import {
  fontkitOutlines,
  loadLetteringFont,
  parseOpentypeFont,
  readFontFile,
  type LetteringFont,
  type LetteringFontFile,
} from '../../../../server/src/integrations/lettering-fonts.ts';
import type { GlyphOutlineSource } from '../../../../server/src/engine/index.ts';

/** The lettering fonts the product ships, by @fontsource package name (Poppins is also the interface font). */
export const SHIPPED_FONTS = ['pacifico', 'fredoka', 'playfair-display', 'great-vibes', 'poppins'] as const;
export type ShippedFont = (typeof SHIPPED_FONTS)[number];

const fileOf = (name: ShippedFont): LetteringFontFile => ({
  fontsourcePackage: `@fontsource/${name}`,
  fileName: `${name}-latin-400-normal.woff`,
});

/** A shipped font's latin 400 WOFF parsed by opentype.js, whatever it can lay out. */
export function loadOpentypeFont(name: ShippedFont): opentype.Font {
  return parseOpentypeFont(readFontFile(fileOf(name)));
}

/** A shipped font laid out by fontkit. */
export function loadFontkitOutlines(name: ShippedFont): GlyphOutlineSource {
  return fontkitOutlines(readFontFile(fileOf(name)));
}

/**
 * The font the server uses for a shipped font: every subset file it ships, each laid out by opentype.js where it
 * can, else fontkit.
 */
export function loadShippedFont(name: ShippedFont): LetteringFont {
  return loadLetteringFont(fileOf(name));
}
