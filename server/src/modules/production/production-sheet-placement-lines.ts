import type { SheetPlacement } from '../../contracts/production-sheet.ts';

/**
 * What the operator reads about one placement besides its size and threads, in the sheet's words: the stitching
 * step, where it goes, the lettering's font and height, the border-hooping warning and the studio's stitch file.
 * The PDF prints these lines; the studio page shows the same facts from the same fields.
 */
export function placementDetailLines(placement: SheetPlacement): { text: string; isWarning: boolean }[] {
  const lines = [{ text: `Stitching step ${placement.sewOrder}.`, isWarning: false }];
  if (placement.position) lines.push({ text: placement.position.words, isWarning: false });
  if (placement.lettering) lines.push({ text: placement.lettering.words, isWarning: false });
  if (placement.hoopingWarning) lines.push({ text: `Caution: ${placement.hoopingWarning.text}`, isWarning: true });
  if (placement.stitchFileName) lines.push({ text: `Stitch file: ${placement.stitchFileName}`, isWarning: false });
  if (placement.kind === 'artwork')
    lines.push({
      text:
        placement.threads.length > 0
          ? 'Threads: the palette’s nearest to the artwork’s own colours; check them against the stitch file.'
          : 'A photo or scan: choose its threads when digitizing.',
      isWarning: false,
    });
  return lines;
}
