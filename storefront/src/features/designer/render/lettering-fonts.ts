// The shipped lettering fonts, loaded only in the designer, where lettering is drawn.
import '@fontsource/pacifico/400.css';
import '@fontsource/fredoka/400.css';
import '@fontsource/playfair-display/400.css';
import '@fontsource/great-vibes/400.css';

/**
 * Waits until each family can draw. Text measured before its font arrives would take a fallback font's widths, and
 * the canvas library caches character widths per family, so the designer measures nothing until this settles. A
 * font that fails to load is drawn in the fallback rather than holding the designer up.
 */
export async function loadLetteringFonts(families: readonly string[]): Promise<void> {
  await Promise.allSettled(families.map((family) => document.fonts.load(`100px "${family}"`, 'Hh')));
}

const capHeights = new Map<string, number>();
/** A capital H is about 0.7 em in most Latin faces; used only if a family cannot be measured. */
const TYPICAL_CAP_HEIGHT = 0.7;

/**
 * The height of a capital H as a share of the font size. The design document sizes lettering by that height, as
 * embroiderers do, while canvases size text by the font's em, so each family is measured once.
 */
export function capHeightRatio(family: string): number {
  const known = capHeights.get(family);
  if (known !== undefined) return known;
  const context = document.createElement('canvas').getContext('2d');
  if (!context) return TYPICAL_CAP_HEIGHT;
  context.font = `100px "${family}"`;
  const ratio = context.measureText('H').actualBoundingBoxAscent / 100 || TYPICAL_CAP_HEIGHT;
  capHeights.set(family, ratio);
  return ratio;
}

/** The font size, in the letter height's own unit, that makes a capital H `letterHeight` tall. */
export const fontSizeFor = (family: string, letterHeight: number) => letterHeight / capHeightRatio(family);
