import { FabricText } from 'fabric/es';
import type { ExtentMm, LetteringMeasure } from '../model/design-setting.ts';
import { fontSizeFor } from './lettering-fonts.ts';

/** Each drag step keeps the name inside its zone, so the same lettering is measured many times a second. */
const measured = new Map<string, ExtentMm>();

/**
 * Measures lettering with the same text object the canvas draws, in millimetres (the font size is given in mm), so
 * the box the model keeps inside a zone is exactly the box the customer sees selected.
 */
export const measureLettering: LetteringMeasure = ({ text, fontFamily, letterHeightMm }) => {
  const key = JSON.stringify([text, fontFamily, letterHeightMm]);
  const known = measured.get(key);
  if (known) return known;
  const probe = new FabricText(text, { fontFamily, fontSize: fontSizeFor(fontFamily, letterHeightMm) });
  const extent = { widthMm: probe.width, heightMm: probe.height };
  measured.set(key, extent);
  return extent;
};
