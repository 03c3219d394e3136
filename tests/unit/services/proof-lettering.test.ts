import { Jimp } from 'jimp';
import { describe, expect, it } from 'vitest';
import { renderProof } from '../../../server/src/modules/orders/proof-render.ts';
import type { ProofScene } from '../../../server/src/modules/orders/proof-scene-repo.ts';
import {
  createLetteringFontLoader,
  parseOpentypeFont,
  readFontFile,
  type LetteringFont,
} from '../../../server/src/integrations/lettering-fonts.ts';

const heirloom = {
  fontsourcePackage: '@fontsource/playfair-display',
  fileName: 'playfair-display-latin-400-normal.woff',
};

/** A plain 200 × 120 mm piece of cloth with one name on it, in a dark thread. */
const sceneWith = (text: string): ProofScene => ({
  document: {
    version: 1,
    placements: [
      {
        id: 'name',
        kind: 'lettering',
        zone: 'chest',
        centerXMm: 100,
        centerYMm: 60,
        rotationDeg: 0,
        text,
        font: 'heirloom-serif',
        letterHeightMm: 30,
        thread: 'WB-110',
      },
    ],
  },
  mockupSvg:
    '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 200 120"><rect width="200" height="120" fill="currentColor"/></svg>',
  mockupWidthMm: 200,
  mockupHeightMm: 120,
  fabricHex: '#f4eee2',
  hemFrontMm: null,
  hemCircumferenceMm: null,
  zones: [],
  motifs: new Map(),
  threadHexes: new Map([['WB-110', '#1d3557']]),
  fonts: new Map([['heirloom-serif', heirloom]]),
  artwork: new Map(),
});

async function picture(text: string, loader: (file: typeof heirloom) => LetteringFont) {
  const { png } = await renderProof(sceneWith(text), loader);
  return Jimp.read(png);
}

describe('the proof picture of a Cyrillic name', () => {
  it('when Маша is drawn for the proof, then it is drawn from the font’s cyrillic file, not as the latin file’s .notdef boxes', async () => {
    // Issue 11: the proof drew boxes. Playfair Display ships a cyrillic subset (@fontsource metadata.json).
    const latinOnly = parseOpentypeFont(readFontFile(heirloom));
    const boxes = Object.assign(latinOnly, { missingCharacters: () => [] }) as unknown as LetteringFont;
    const [real, boxed] = await Promise.all([
      picture('Маша', createLetteringFontLoader()),
      picture('Маша', () => boxes),
    ]);
    expect(real.width).toBe(boxed.width);
    const differing = real.bitmap.data.reduce(
      (count, value, i) => count + Number(i % 4 === 0 && Math.abs(value - boxed.bitmap.data[i]) > 40),
      0,
    );
    // Thousands of pixels differ where real letters replace four boxes.
    expect(differing).toBeGreaterThan(1000);
  });
});
