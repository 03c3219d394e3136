/**
 * Checks an uploaded file before anything keeps it: the bytes decide the type (never the name or the browser's
 * Content-Type), an SVG is sanitized and its declared size checked, and a raster image's width and height are read
 * from its header (image-size) and refused past the pixel budget before a single pixel is decoded; only then is it
 * decoded and re-encoded as PNG, so only a clean copy is stored. Used by customer artwork, studio motifs, garment
 * drawings and stitch-out photos, inside the heavy-work pool's threads (see `heavy-work.ts`).
 */
import { fileTypeFromBuffer } from 'file-type';
import { imageSize } from 'image-size';
import { Jimp, JimpMime } from 'jimp';
import { failure, ok, type Result } from '../contracts/result.ts';
import { MAX_RASTER_MEGAPIXELS, MAX_SVG_SIDE_PX, MAX_SVG_VIEWBOX_UNITS } from '../contracts/upload-limits.ts';
import { sanitizeSvg } from './sanitize-svg.ts';

export type UploadKind = 'svg' | 'png' | 'jpeg';

export type InspectedUpload =
  | { kind: 'svg'; mimeType: 'image/svg+xml'; svg: string; widthPx: number; heightPx: number }
  | { kind: 'png' | 'jpeg'; mimeType: 'image/png' | 'image/jpeg'; png: Buffer; widthPx: number; heightPx: number };

const kindNames: Record<UploadKind, string> = { svg: 'SVG', png: 'PNG', jpeg: 'JPEG' };
/** Larger rasters are scaled down before storing: a proof or artwork preview needs no more. */
const MAX_RASTER_SIDE_PX = 2400;
const MAX_RASTER_PIXELS = MAX_RASTER_MEGAPIXELS * 1_000_000;

const count = (value: number) => Math.round(value).toLocaleString('en-GB');

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

/** The root's size in px (width and height, else the viewBox), or why it cannot be used. */
function svgSize(svg: string): Result<{ widthPx: number; heightPx: number }> {
  const root = /<svg\b[^>]*>/i.exec(svg)?.[0] ?? '';
  const attribute = (name: string) => new RegExp(`\\s${name}\\s*=\\s*["']([^"']*)["']`, 'i').exec(root)?.[1];
  const viewBox = attribute('viewBox')
    ?.trim()
    .split(/[\s,]+/)
    .map(Number);
  const hugeBox = viewBox?.find((value) => !Number.isFinite(value) || Math.abs(value) > MAX_SVG_VIEWBOX_UNITS);
  if (hugeBox !== undefined)
    return failure(
      'invalid',
      `The SVG's viewBox holds ${Number.isFinite(hugeBox) ? count(hugeBox) : 'a number too large to read'}; keep each of its numbers within ${count(MAX_SVG_VIEWBOX_UNITS)} units.`,
    );
  const number = (value: string | undefined) =>
    value && /^\s*[\d.]+\s*(px)?\s*$/.test(value) ? Number.parseFloat(value) : undefined;
  const width = number(attribute('width')) ?? viewBox?.[2];
  const height = number(attribute('height')) ?? viewBox?.[3];
  if (!width || !height || !Number.isFinite(width) || !Number.isFinite(height) || width <= 0 || height <= 0)
    return failure('invalid', 'The SVG has no size: give the <svg> element a viewBox or width and height.');
  if (width > MAX_SVG_SIDE_PX || height > MAX_SVG_SIDE_PX)
    return failure(
      'invalid',
      `The SVG says it is ${count(width)} × ${count(height)} px; an SVG may be at most ${count(MAX_SVG_SIDE_PX)} px on each side, so give it a smaller width, height or viewBox.`,
    );
  return ok({ widthPx: Math.max(1, Math.round(width)), heightPx: Math.max(1, Math.round(height)) });
}

function inspectSvg(buffer: Buffer): Result<InspectedUpload> {
  const clean = sanitizeSvg(buffer.toString('utf8'));
  if (!/<svg[\s>]/i.test(clean))
    return failure('invalid', 'Nothing drawable was left in that SVG once scripts and links were removed.');
  const size = svgSize(clean);
  if (!size.ok) return size;
  return ok({ kind: 'svg', mimeType: 'image/svg+xml', svg: clean, ...size.value });
}

/**
 * The raster's size from its header alone, refused past the pixel budget: a 45-byte PNG can declare
 * 20,000 × 20,000 px, which decoded would take 1.6 GB.
 */
function checkDeclaredPixels(buffer: Buffer, kind: 'png' | 'jpeg'): Result<{ widthPx: number; heightPx: number }> {
  let declared: { width?: number; height?: number };
  try {
    declared = imageSize(buffer);
  } catch {
    return failure('invalid', `The ${kindNames[kind]} file is damaged: its size cannot be read.`);
  }
  const { width, height } = declared;
  if (!width || !height) return failure('invalid', `The ${kindNames[kind]} file is damaged: its size cannot be read.`);
  if (width * height > MAX_RASTER_PIXELS)
    return failure(
      'too-large',
      `That picture is ${count(width)} × ${count(height)} px (${count((width * height) / 1_000_000)} megapixels); please upload one under ${MAX_RASTER_MEGAPIXELS} megapixels.`,
    );
  return ok({ widthPx: width, heightPx: height });
}

export async function inspectUpload(buffer: Buffer, allowed: readonly UploadKind[]): Promise<Result<InspectedUpload>> {
  if (buffer.length === 0) return failure('invalid', 'The file is empty. Choose the picture again.');

  if (looksLikeSvg(buffer)) {
    if (!allowed.includes('svg'))
      return failure('unsupported-type', `That is an SVG; please upload a ${expected(allowed)} file.`);
    return inspectSvg(buffer);
  }

  const sniffed = await fileTypeFromBuffer(buffer);
  const kind = sniffed?.mime === 'image/png' ? 'png' : sniffed?.mime === 'image/jpeg' ? 'jpeg' : undefined;
  if (!kind || !allowed.includes(kind)) {
    const what = sniffed ? `a ${sniffed.ext.toUpperCase()} file` : 'not a picture we can read';
    return failure('unsupported-type', `That file is ${what}; please upload a ${expected(allowed)} file.`);
  }
  const declared = checkDeclaredPixels(buffer, kind);
  if (!declared.ok) return declared;
  let image: Awaited<ReturnType<typeof Jimp.read>>;
  try {
    image = await Jimp.read(buffer);
  } catch {
    return failure('invalid', `The ${kindNames[kind]} file is damaged and could not be opened.`);
  }
  // The header can lie in the other direction too; what was decoded is what counts.
  if (image.width * image.height > MAX_RASTER_PIXELS)
    return failure(
      'too-large',
      `That picture has too many pixels; please upload one under ${MAX_RASTER_MEGAPIXELS} megapixels.`,
    );
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
