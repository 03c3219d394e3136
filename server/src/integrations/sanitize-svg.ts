/**
 * Cleans uploaded SVG: DOMPurify removes scripts, event handlers and foreign content, and the hooks here remove
 * every reference that would make a viewer fetch something: a link, a `url(…)` in an attribute, a style or a
 * style sheet, an `@import`. What stays may point only inside the same document (`#id`) or hold a raster picture
 * inline (`data:image/png|jpeg|gif|webp`); anything else is cut, so a stored drawing can never call out.
 */
import createDOMPurify from 'dompurify';
import { JSDOM } from 'jsdom';

const purify = createDOMPurify(new JSDOM('').window as unknown as Parameters<typeof createDOMPurify>[0]);

/** An inline raster picture; `data:image/svg+xml` is left out, as it is a document of its own with references. */
const INLINE_RASTER = /^data:image\/(png|jpeg|gif|webp)[;,]/i;
/** Attributes that name a resource by their whole value (SVG 1.1's `xlink:href`, SVG 2's `href`, HTML's `src`). */
const REFERENCE_ATTRIBUTE = /^(?:(?:[a-z-]+:)?href|src)$/i;
/** CSS functions that load a resource from a string rather than `url(…)`. */
const LOADING_FUNCTION = /(?:-webkit-)?image-set\s*\(|\bsrc\s*\(|\bimage\s*\(|\bcross-fade\s*\(|\belement\s*\(/i;
const CSS_URL = /url\(\s*(?:"([^"]*)"|'([^']*)'|([^)]*?))\s*\)/gi;

const isSameDocument = (target: string) => target.trim().startsWith('#');
const isAllowedTarget = (target: string) => isSameDocument(target) || INLINE_RASTER.test(target.trim());

/**
 * CSS with every outside reference neutralised: `@import` rules dropped, `url(…)` to anything but `#id` or an
 * inline raster replaced by `none`, declarations using other loading functions dropped. CSS escapes can spell
 * `url` in disguise, so text with a backslash is dropped whole: a child's drawing needs none.
 */
export function withoutExternalCss(css: string): string {
  if (css.includes('\\')) return '';
  return css
    .replace(/\/\*[\s\S]*?\*\//g, '')
    .replace(/@import\b[^;]*;?/gi, '')
    .replace(CSS_URL, (whole, double?: string, single?: string, bare?: string) =>
      isAllowedTarget(double ?? single ?? bare ?? '') ? whole : 'none',
    )
    .split(/(?<=[;{}])/)
    .filter((piece) => !LOADING_FUNCTION.test(piece))
    .join('');
}

purify.addHook('uponSanitizeAttribute', (_node, data) => {
  const name = data.attrName;
  const value = data.attrValue ?? '';
  if (REFERENCE_ATTRIBUTE.test(name)) {
    if (!isSameDocument(value)) data.keepAttr = false;
    return;
  }
  if (/url\(|image-set|\\/i.test(value) || name.toLowerCase() === 'style') {
    const clean = withoutExternalCss(value);
    if (clean.trim() === '') data.keepAttr = false;
    else data.attrValue = clean;
  }
});

purify.addHook('uponSanitizeElement', (node, data) => {
  if (data.tagName === 'style' && node.textContent) node.textContent = withoutExternalCss(node.textContent);
});

/** Strips scripts, event handlers, foreign content and every external reference, keeping SVG drawing elements. */
export function sanitizeSvg(svg: string): string {
  return purify.sanitize(svg, {
    USE_PROFILES: { svg: true, svgFilters: true },
    // <use> is DOMPurify's to drop, as it can pull in another document; with every reference but `#id` cut by
    // the hook above it only repeats a shape of this one.
    ADD_TAGS: ['use'],
    // <image> and <feImage> exist to show another file; <foreignObject> embeds HTML.
    FORBID_TAGS: ['foreignObject', 'image', 'feImage'],
  });
}
