import * as fontkit from 'fontkit';
import { describe, expect, it } from 'vitest';
import { estimateStitches } from '../../../server/src/engine/index.ts';
import { extentOf, filledArea, flattenOutline } from '../../../server/src/engine/outline-geometry.ts';
import {
  loadLetteringFont,
  parseOpentypeFont,
  readFontFile,
  type LetteringFontFile,
} from '../../../server/src/integrations/lettering-fonts.ts';
import { describeCharacters } from '../../../server/src/integrations/character-names.ts';

const fileOf = (family: string, subset = 'latin'): LetteringFontFile => ({
  fontsourcePackage: `@fontsource/${family}`,
  fileName: `${family}-${subset}-400-normal.woff`,
});

function lettering(font: ReturnType<typeof loadLetteringFont> | ReturnType<typeof parseOpentypeFont>, text: string) {
  const estimate = estimateStitches({ kind: 'lettering', text, font, letterHeightMm: 20 });
  if (!estimate.ok) throw new Error(estimate.reason);
  return estimate;
}

/** Area of one character's outline at 1 unit per em, nonzero fill. */
const areaOf = (commands: Parameters<typeof flattenOutline>[0]) =>
  filledArea(flattenOutline(commands, 1e-5), 'nonzero');

/**
 * The same character read straight from the subset file by fontkit, an independent font reader, in the engine's
 * outline commands (y down, 1 unit = 1 em).
 */
function fontkitGlyphArea(file: LetteringFontFile, character: string): number {
  const font = fontkit.create(readFontFile(file));
  if (!('layout' in font)) throw new Error('a collection');
  const glyph = font.glyphForCodePoint(character.codePointAt(0)!);
  const scale = 1 / font.unitsPerEm;
  const at = (args: number[], k: number) => ({ x: args[k] * scale, y: -args[k + 1] * scale });
  const commands = glyph.path.commands.map(({ command, args }) => {
    if (command === 'moveTo') return { type: 'M' as const, ...at(args, 0) };
    if (command === 'lineTo') return { type: 'L' as const, ...at(args, 0) };
    if (command === 'quadraticCurveTo') {
      const c = at(args, 0);
      return { type: 'Q' as const, x1: c.x, y1: c.y, ...at(args, 2) };
    }
    if (command === 'bezierCurveTo') {
      const [a, b] = [at(args, 0), at(args, 2)];
      return { type: 'C' as const, x1: a.x, y1: a.y, x2: b.x, y2: b.y, ...at(args, 4) };
    }
    return { type: 'Z' as const };
  });
  return areaOf(commands);
}

// Names from four scripts and diacritics a latin-only file lacks (Unicode: Ł U+0141, Š U+0160, ễ U+1EC5,
// Cyrillic U+041C…). Each letter beyond basic Latin is checked against the subset file that @fontsource's
// unicode.json assigns it to, read by fontkit.
describe.each([
  ['Polish', 'Łucja', 'pacifico', 'Ł', 'latin-ext'],
  ['Czech', 'Šárka', 'playfair-display', 'Š', 'latin-ext'],
  ['Vietnamese', 'Nguyễn', 'pacifico', 'ễ', 'vietnamese'],
  ['Cyrillic', 'Маша', 'playfair-display', 'М', 'cyrillic'],
])('a %s name, %s, in %s', (_, name, family, letter, subset) => {
  const font = loadLetteringFont(fileOf(family));
  const latinOnly = parseOpentypeFont(readFontFile(fileOf(family)));

  it('when it is lettered, then every character has a letter in one of the font’s subset files', () => {
    expect(font.missingCharacters(name)).toEqual([]);
    // The latin file alone has no glyph for it: it would draw .notdef (glyph 0), a box or nothing.
    expect(latinOnly.charToGlyphIndex(letter)).toBe(0);
  });

  it('when it is priced, then the count comes from the real letter, not from the latin file’s .notdef box', () => {
    const before = estimateStitches({ kind: 'lettering', text: name, font: latinOnly, letterHeightMm: 20 });
    expect(lettering(font, name).stitches).not.toBe(before.ok ? before.stitches : 'no outline at all');
    const [glyph] = font.getPaths(letter, 0, 0, 1);
    expect(areaOf(glyph.commands)).toBeGreaterThan(0);
    expect(areaOf(glyph.commands)).toBeCloseTo(fontkitGlyphArea(fileOf(family, subset), letter), 4);
  });
});

describe('loadLetteringFont', () => {
  it('when a name mixes subsets, then each run is placed after the last one’s advance, as a browser sets it', () => {
    const pacifico = loadLetteringFont(fileOf('pacifico'));
    const latinExt = fontkit.create(readFontFile(fileOf('pacifico', 'latin-ext')));
    if (!('layout' in latinExt)) throw new Error('a collection');
    // Ł's advance read by fontkit from the latin-ext file (font units per em); the u after it comes from the latin
    // file, so it starts that far to the right of where it starts alone.
    const advance = latinExt.glyphForCodePoint(0x141).advanceWidth / latinExt.unitsPerEm;
    const leftOf = (commands: Parameters<typeof flattenOutline>[0]) => extentOf(flattenOutline(commands, 1e-5))!.minX;
    const [, u] = pacifico.getPaths('Łu', 0, 0, 1);
    const [alone] = pacifico.getPaths('u', 0, 0, 1);
    expect(leftOf(u.commands)).toBeCloseTo(leftOf(alone.commands) + advance, 6);
  });

  it('when the font has no letters for some characters, then it names each once, in order', () => {
    const fredoka = loadLetteringFont(fileOf('fredoka'));
    // Fredoka ships hebrew, latin and latin-ext only (its metadata.json): no Cyrillic, no Vietnamese ễ.
    expect(fredoka.missingCharacters('Маша')).toEqual(['М', 'а', 'ш']);
    expect(fredoka.missingCharacters('Nguyễn')).toEqual(['ễ']);
    expect(fredoka.missingCharacters('Zoë 🌼')).toEqual(['🌼']);
    expect(fredoka.missingCharacters('Łucja Šárka')).toEqual([]);
  });

  it('when text is typed decomposed, then it is set as its composed letters (Unicode normalization form C)', () => {
    const pacifico = loadLetteringFont(fileOf('pacifico'));
    expect(pacifico.missingCharacters('Nguye\u0302\u0303n')).toEqual([]);
    expect(lettering(pacifico, 'Nguye\u0302\u0303n').stitches).toBe(lettering(pacifico, 'Nguyễn').stitches);
  });
});

describe('describeCharacters', () => {
  it('when characters are named, then each carries its Unicode name (the Unicode Character Database)', () => {
    expect(describeCharacters(['ễ'])).toBe('“ễ” (Latin small letter e with circumflex and tilde)');
    expect(describeCharacters(['М', 'а'])).toBe('“М” (Cyrillic capital letter em) and “а” (Cyrillic small letter a)');
  });
});
