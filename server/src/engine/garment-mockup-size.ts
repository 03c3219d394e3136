/** The opening tag of the drawing's root element; `[^>]*` cannot backtrack, however long the drawing. */
const SVG_OPEN_TAG = /<svg\b[^>]*>/;
/** An attribute of that tag by exact (case-sensitive, as in SVG) name, not a suffix of another (`data-width`). */
const attribute = (name: string) => new RegExp(`\\s${name}\\s*=\\s*(?:"([^"]*)"|'([^']*)')`);
const VIEW_BOX = attribute('viewBox');
const WIDTH = attribute('width');
const HEIGHT = attribute('height');
/** A length in millimetres: unitless (user units, which are mm in our drawings) or with an explicit "mm". */
const MM_LENGTH = /^(\d+(?:\.\d+)?)(?:mm)?$/;

/**
 * The drawing's size at the reference size, mm. Garment drawings are made with the viewBox "0 0 W H" in
 * millimetres (see the garments migration), so the storefront can lay zones over the mockup without parsing
 * SVG itself; it is read here once, with a regex over the root tag rather than an XML parser, because only two
 * attributes of one tag are needed. A drawing without a viewBox falls back to its width and height attributes.
 * A drawing with neither is a broken catalogue row, so it throws rather than guessing a size.
 */
export function mockupSizeMm(svg: string, slug: string): { widthMm: number; heightMm: number } {
  const tag = SVG_OPEN_TAG.exec(svg)?.[0] ?? '';
  const valueOf = (pattern: RegExp) => {
    const match = pattern.exec(tag);
    return (match?.[1] ?? match?.[2] ?? '').trim();
  };
  const box = valueOf(VIEW_BOX)
    .split(/[\s,]+/)
    .map(Number);
  const [, , boxWidth = NaN, boxHeight = NaN] = box;
  if (box.length === 4 && box.every(Number.isFinite) && boxWidth > 0 && boxHeight > 0)
    return { widthMm: boxWidth, heightMm: boxHeight };
  const widthMm = Number(MM_LENGTH.exec(valueOf(WIDTH))?.[1] ?? NaN);
  const heightMm = Number(MM_LENGTH.exec(valueOf(HEIGHT))?.[1] ?? NaN);
  if (widthMm > 0 && heightMm > 0) return { widthMm, heightMm };
  throw new Error(`The mockup of garment ${slug} has neither a viewBox nor a width and height in millimetres`);
}
