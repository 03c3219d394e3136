/**
 * The customer's own artwork on the sheet: the palette threads nearest its colours and the outline (or, for a
 * photo or scan, the picture itself) its 1:1 template prints.
 */
import type { SheetPlacement } from '../../contracts/production-sheet.ts';
import { artworkHeightMm } from '../../engine/artwork-picture.ts';
import { nearestThreads } from '../../engine/nearest-threads.ts';
import { readSvgDrawing } from '../../engine/svg-document.ts';
import type { ArtworkPicture } from '../artwork/artwork-service.ts';
import { motifOutline, type ArtworkOutline } from './production-sheet-outlines.ts';
import type { ThreadRow } from './production-sheet-repo.ts';

/**
 * One thread per distinct colour of the drawing, in the order the drawing paints them (its first shape first),
 * each the palette's nearest by CIEDE2000. Two colours nearest the same thread share its step. A photo or scan
 * has no colours to read: the studio picks its threads when digitizing, so its list is empty.
 */
export function artworkThreads(picture: ArtworkPicture, palette: readonly ThreadRow[]): SheetPlacement['threads'] {
  if (picture.kind !== 'svg' || palette.length === 0) return [];
  const drawing = readSvgDrawing(picture.svg);
  if ('reason' in drawing) return [];
  const colours = [...new Set(drawing.drawables.flatMap((d) => [d.fill, d.stroke]).filter((hex) => hex !== null))];
  const threads: ThreadRow[] = [];
  for (const hex of colours) {
    const match = nearestThreads(hex, palette, 1);
    const thread = match.ok ? match.matches[0]?.thread : undefined;
    if (thread && !threads.some((known) => known.code === thread.code)) threads.push(thread);
  }
  return threads.map((thread, i) => ({ order: i + 1, code: thread.code, name: thread.name, hex: thread.hex }));
}

/** The artwork at the placement's width: a drawing's shapes, or a raster's picture in its box. */
export function artworkTemplateOutline(picture: ArtworkPicture, widthMm: number): ArtworkOutline | undefined {
  const heightMm = artworkHeightMm(widthMm, picture);
  if (picture.kind === 'svg') return motifOutline(picture.svg, { widthMm, heightMm }, 1);
  return {
    widthMm,
    heightMm,
    outlines: [],
    pictureDataUrl: `data:image/png;base64,${Buffer.from(picture.png).toString('base64')}`,
  };
}
