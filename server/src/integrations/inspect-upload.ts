/**
 * Checks an uploaded file before anything keeps it: the bytes decide the type (never the name or the browser's
 * Content-Type), an SVG is sanitized and a raster image is decoded and re-encoded as PNG, so only a clean copy is
 * stored. Used by customer artwork, studio motifs and stitch-out photos.
 */
import createDOMPurify from 'dompurify';
import { fileTypeFromBuffer } from 'file-type';
import { Jimp, JimpMime } from 'jimp';
import { JSDOM } from 'jsdom';
import { failure, ok, type Result } from '../contracts/result.ts';

export type UploadKind = 'svg' | 'png' | 'jpeg';

export type InspectedUpload =
  | { kind: 'svg'; mimeType: 'image/svg+xml'; svg: string; widthPx: number; heightPx: number }
  | { kind: 'png' | 'jpeg'; mimeType: 'image/png' | 'image/jpeg'; png: Buffer; widthPx: number; heightPx: number };

const kindNames: Record<UploadKind, string> = { svg: 'SVG', png: 'PNG', jpeg: 'JPEG' };
/** Larger rasters are scaled down before storing: a proof or artwork preview needs no more. */
const MAX_RASTER_SIDE_PX = 2400;
/** Past this, decoding a small file could still take a great deal of memory (a "decompression bomb"). */
const MAX_RASTER_PIXELS = 40_000_000;

const purify = createDOMPurify(new JSDOM('').window as unknown as Parameters<typeof createDOMPurify>[0]);

function expected(allowed: readonly UploadKind[]): string {
  const names = allowed.map((kind) => kindNames[kind]);
  return names.length === 1 ? names[0]! : `${names.slice(0, -1).join(', ')} or ${names.at(-1)}`;
}

/** True when the text is an SVG document: an optional XML prolog, comments or doctype, then `<svg`. */
function looksLikeSvg(buffer: Buffer): boolean {
  const head = buffer
    .subarray(0, 4096)
    .toString('utf8')
    .replace(/^\uFEFF/, '');
  return /^\s*(<\?xml[^>]*\?>\s*)?(<!--[\s\S]*?-->\s*|<!DOCTYPE[^>]*>\s*)*<svg[\s>]/i.test(head);
}

function svgSize(svg: string): { widthPx: number; heightPx: number } | undefined {
  const root = /<svg\b[^>]*>/i.exec(svg)?.[0] ?? '';
  const attribute = (name: string) => new RegExp(`\\s${name}\\s*=\\s*["']([^"']*)["']`, 'i').exec(root)?.[1];
  const viewBox = attribute('viewBox')
    ?.trim()
    .split(/[\s,]+/)
    .map(Number);
  const number = (value: string | undefined) =>
    value && /^\s*[\d.]+\s*(px)?\s*$/.test(value) ? Number.parseFloat(value) : undefined;
  const width = number(attribute('width')) ?? viewBox?.[2];
  const height = number(attribute('height')) ?? viewBox?.[3];
  if (!width || !height || !Number.isFinite(width) || !Number.isFinite(height) || width <= 0 || height <= 0)
    return undefined;
  return { widthPx: Math.round(width), heightPx: Math.round(height) };
}

/** Strips scripts, event handlers, external references and foreign content, keeping SVG drawing elements. */
export function sanitizeSvg(svg: string): string {
  return purify.sanitize(svg, {
    USE_PROFILES: { svg: true, svgFilters: true },
    FORBID_TAGS: ['foreignObject', 'image'],
  });
}

export async function inspectUpload(buffer: Buffer, allowed: readonly UploadKind[]): Promise<Result<InspectedUpload>> {
  if (buffer.length === 0) return failure('invalid', 'The file is empty. Choose the picture again.');

  if (looksLikeSvg(buffer)) {
    if (!allowed.includes('svg'))
      return failure('unsupported-type', `That is an SVG; please upload a ${expected(allowed)} file.`);
    const clean = sanitizeSvg(buffer.toString('utf8'));
    if (!/<svg[\s>]/i.test(clean))
      return failure('invalid', 'Nothing drawable was left in that SVG once scripts and links were removed.');
    const size = svgSize(clean);
    if (!size) return failure('invalid', 'The SVG has no size: give the <svg> element a viewBox or width and height.');
    return ok({ kind: 'svg', mimeType: 'image/svg+xml', svg: clean, ...size });
  }

  const sniffed = await fileTypeFromBuffer(buffer);
  const kind = sniffed?.mime === 'image/png' ? 'png' : sniffed?.mime === 'image/jpeg' ? 'jpeg' : undefined;
  if (!kind || !allowed.includes(kind)) {
    const what = sniffed ? `a ${sniffed.ext.toUpperCase()} file` : 'not a picture we can read';
    return failure('unsupported-type', `That file is ${what}; please upload a ${expected(allowed)} file.`);
  }
  let image: Awaited<ReturnType<typeof Jimp.read>>;
  try {
    image = await Jimp.read(buffer);
  } catch {
    return failure('invalid', `The ${kindNames[kind]} file is damaged and could not be opened.`);
  }
  if (image.width * image.height > MAX_RASTER_PIXELS)
    return failure('too-large', 'That picture has too many pixels; please upload one under 40 megapixels.');
  if (Math.max(image.width, image.height) > MAX_RASTER_SIDE_PX) {
    image.scaleToFit({ w: MAX_RASTER_SIDE_PX, h: MAX_RASTER_SIDE_PX });
  }
  const png = await image.getBuffer(JimpMime.png);
  return ok({
    kind,
    mimeType: kind === 'png' ? 'image/png' : 'image/jpeg',
    png,
    widthPx: image.width,
    heightPx: image.height,
  });
}
