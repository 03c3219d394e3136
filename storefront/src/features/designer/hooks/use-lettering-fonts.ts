import { useEffect, useState } from 'react';
import type { LetteringFontSummary } from '@server/contracts/catalogue.ts';
import { loadLetteringFonts } from '../render/lettering-fonts.ts';

/** True once the catalogue's lettering fonts can be drawn and measured. */
export function useLetteringFontsReady(fonts: readonly LetteringFontSummary[]): boolean {
  const families = [...new Set(fonts.map((font) => font.fontFamily))].join('\n');
  const [readyFor, setReadyFor] = useState<string>();
  useEffect(() => {
    let isCurrent = true;
    void loadLetteringFonts(families.split('\n').filter(Boolean)).then(() => {
      if (isCurrent) setReadyFor(families);
    });
    return () => {
      isCurrent = false;
    };
  }, [families]);
  return readyFor === families;
}
