import type { LetteringFontSummary } from '@server/contracts/catalogue.ts';
import { designLimits } from '@server/contracts/designs.ts';

/** The design document contract's limit: a name or a short phrase on a child's garment. */
export const MAX_LETTERING_LENGTH = designLimits.maxLetteringLength;

export type LetteringTextCheck = { ok: true; text: string } | { ok: false; message: string };

/** The contract's rules for lettering text, checked before the text goes into the document. */
export function checkLetteringText(text: string): LetteringTextCheck {
  if (text.trim() === '') return { ok: false, message: 'Type the name or words to stitch.' };
  if ([...text].length > MAX_LETTERING_LENGTH)
    return { ok: false, message: `Keep it to ${MAX_LETTERING_LENGTH} letters and spaces or fewer.` };
  if (/\p{Cc}/u.test(text)) return { ok: false, message: 'Lettering is one line of text.' };
  return { ok: true, text };
}

/** A letter height this font sews cleanly at, mm, to the nearest half millimetre. */
export function clampLetterHeight(font: LetteringFontSummary, heightMm: number): number {
  const rounded = Math.round(heightMm * 2) / 2;
  return Math.min(Math.max(rounded, font.minHeightMm), font.maxHeightMm);
}
