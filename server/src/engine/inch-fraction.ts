import { MM_PER_INCH } from './units.ts';

/** A length in inches to the nearest sixteenth, the fraction reduced: 173 mm → 6 13/16, 50 mm → 1 15/16. */
export interface InchFraction {
  whole: number;
  /** 0 when the length is a whole number of inches. */
  numerator: number;
  denominator: number;
}

/** The nearest sixteenth of an inch to `mm` (its size; the sign is the caller's), as rulers and tape measures read. */
export function toInchFraction(mm: number): InchFraction {
  const sixteenths = Math.round((Math.abs(mm) / MM_PER_INCH) * 16);
  let numerator = sixteenths % 16;
  let denominator = 16;
  while (numerator > 0 && numerator % 2 === 0) {
    numerator /= 2;
    denominator /= 2;
  }
  return { whole: Math.floor(sixteenths / 16), numerator, denominator };
}
