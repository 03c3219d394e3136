/**
 * Reads the lettering fonts the app ships through @fontsource packages and turns them into the engine's glyph
 * outline source. The engine never touches files, so this is the one place that does. A @fontsource font comes as
 * one file per subset (latin, latin-ext, cyrillic, greek, vietnamese…), each declared for its own Unicode range, and
 * a browser takes every character from the file whose range holds it; a lettering font here is all of its subset
 * files put together the same way, so quotes, proofs and sheets measure the letters the designer shows.
 */
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import * as fontkit from 'fontkit';
import opentype from 'opentype.js';
import type { GlyphOutlineSource, OutlineCommand } from '../engine/index.ts';

/** Where a font's file is: an @fontsource package and a .woff in its `files/` folder (lettering_fonts columns). */
export interface LetteringFontFile {
  fontsourcePackage: string;
  fileName: string;
}

/** A shipped font with every subset it ships: outlines for any text, and the characters it has no letter for. */
export interface LetteringFont extends GlyphOutlineSource {
  /** Each character of the text (NFC) that no subset of the font draws, once, in order of appearance. */
  missingCharacters(text: string): string[];
}

/** Gives a shipped font; throws when a file is missing, which is a broken install, not bad input. */
export type LetteringFontLoader = (file: LetteringFontFile) => LetteringFont;

const requireFromHere = createRequire(import.meta.url);

/** The names come from the database; keeping them to this shape means a row can never point outside the package. */
const PACKAGE_NAME = /^@fontsource\/[a-z0-9-]+$/;
const WOFF_FILE_NAME = /^[a-z0-9-]+\.woff$/;

/** A typesetter's test word with common letter pairs, enough to reach the lookups a layout engine applies. */
const LAYOUT_PROBE_TEXT = 'Hamburgefonstiv';

/** The bytes of a shipped font file. Only WOFF: opentype.js 2.0 throws on WOFF2 without a decompressor. */
export function readFontFile(file: LetteringFontFile): Buffer {
  if (!PACKAGE_NAME.test(file.fontsourcePackage) || !WOFF_FILE_NAME.test(file.fileName)) {
    throw new Error(`Not a shipped @fontsource .woff file: ${file.fontsourcePackage}/${file.fileName}`);
  }
  return readFileSync(requireFromHere.resolve(`${file.fontsourcePackage}/files/${file.fileName}`));
}

/** A font parsed by opentype.js, whose `Font` is a glyph outline source as it is (default import only in Node). */
export function parseOpentypeFont(bytes: Buffer): opentype.Font {
  return opentype.parse(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength));
}

/** A font laid out by fontkit, adapted to the engine's outline interface (y down, in units of fontSize). */
export function fontkitOutlines(bytes: Buffer): GlyphOutlineSource {
  const font = fontkit.create(bytes);
  if (!('layout' in font)) throw new Error('The font file is a collection, not one font');
  return {
    getPaths(text, x, y, fontSize) {
      const scale = fontSize / font.unitsPerEm;
      const run = font.layout(text);
      let penX = x;
      return run.glyphs.map((glyph, i) => {
        const position = run.positions[i];
        const originX = penX + position.xOffset * scale;
        const originY = y - position.yOffset * scale;
        penX += position.xAdvance * scale;
        // Font units have y up; the engine, like SVG and opentype.js paths, has y down.
        const at = (args: number[], k: number) => ({ x: originX + args[k] * scale, y: originY - args[k + 1] * scale });
        const commands = glyph.path.commands.map(({ command, args }): OutlineCommand => {
          if (command === 'moveTo') return { type: 'M', ...at(args, 0) };
          if (command === 'lineTo') return { type: 'L', ...at(args, 0) };
          if (command === 'quadraticCurveTo') {
            const control = at(args, 0);
            return { type: 'Q', x1: control.x, y1: control.y, ...at(args, 2) };
          }
          if (command === 'bezierCurveTo') {
            const [first, second] = [at(args, 0), at(args, 2)];
            return { type: 'C', x1: first.x, y1: first.y, x2: second.x, y2: second.y, ...at(args, 4) };
          }
          return { type: 'Z' };
        });
        return { commands };
      });
    },
  };
}

/** One subset file: what it covers, whether it draws a character, its outlines and how far a run advances. */
interface FontFace {
  ranges: readonly (readonly [number, number])[];
  draws(codePoint: number): boolean;
  outlines: GlyphOutlineSource;
  /** Pen advance of a run of text at `fontSize`, in the units of `fontSize`. */
  advance(text: string, fontSize: number): number;
}

/**
 * One subset file as outlines: opentype.js where it can lay the font out, else fontkit. opentype.js 2.0 throws on
 * substitution lookups it does not implement (Great Vibes: "lookupType: 6 - substFormat: 2 is not yet
 * supported", for any text longer than one letter), so a file that fails its probe is shaped by fontkit. The probe
 * is the typesetter's word plus letters of the file's own range, so a Cyrillic file meets its own lookups.
 */
function readFace(file: LetteringFontFile, ranges: FontFace['ranges']): FontFace {
  const bytes = readFontFile(file);
  const font = parseOpentypeFont(bytes);
  const covers = (codePoint: number) => ranges.some(([from, to]) => codePoint >= from && codePoint <= to);
  const draws = (codePoint: number) => covers(codePoint) && font.charToGlyphIndex(String.fromCodePoint(codePoint)) > 0;
  try {
    font.getPaths(`${LAYOUT_PROBE_TEXT} ${ownLetters(ranges, draws)}`, 0, 0, 1);
    return { ranges, draws, outlines: font, advance: (text, fontSize) => font.getAdvanceWidth(text, fontSize) };
  } catch {
    const laidOut = fontkit.create(bytes);
    if (!('layout' in laidOut)) throw new Error('The font file is a collection, not one font');
    return {
      ranges,
      draws: (codePoint) => covers(codePoint) && laidOut.hasGlyphForCodePoint(codePoint),
      outlines: fontkitOutlines(bytes),
      advance: (text, fontSize) => (laidOut.layout(text).advanceWidth * fontSize) / laidOut.unitsPerEm,
    };
  }
}

/** Up to 16 letters the file draws, from the start of its range: enough to reach its own lookups. */
function ownLetters(ranges: FontFace['ranges'], draws: (codePoint: number) => boolean): string {
  const letters: string[] = [];
  for (const [from, to] of ranges) {
    for (let codePoint = from; codePoint <= to && letters.length < 16; codePoint += 1) {
      const character = String.fromCodePoint(codePoint);
      if (/\p{L}/u.test(character) && draws(codePoint)) letters.push(character);
    }
  }
  return letters.join('');
}

/** "U+0100-02BA,U+0304" (a CSS unicode-range, as @fontsource's unicode.json gives it) as code point pairs. */
function parseUnicodeRange(range: string): [number, number][] {
  return range.split(',').map((part) => {
    const [from, to = from] = part.trim().replace(/^U\+/i, '').split('-');
    return [parseInt(from, 16), parseInt(to, 16)];
  });
}

/** A character of the text and the subset file that draws it (undefined when none does). */
function faceOf(faces: readonly FontFace[], character: string, previous: FontFace | undefined) {
  const codePoint = character.codePointAt(0)!;
  // A combining mark stays with the letter before it when that file draws it, as browsers keep a cluster together.
  if (previous && /\p{M}/u.test(character) && previous.draws(codePoint)) return previous;
  return faces.find((face) => face.draws(codePoint));
}

/**
 * Every subset file the font ships for this weight and style, put together as a browser does with @font-face
 * unicode-range: each character comes from a file whose range holds it and that has a glyph for it; where ranges
 * overlap, the file declared last in the package's CSS is tried first (CSS Fonts Level 4, §4.5 "unicode-range";
 * @fontsource declares the subsets in the order of its unicode.json, latin last). Runs of text from one file are
 * laid out by that file and placed one after another.
 */
export function loadLetteringFont(file: LetteringFontFile): LetteringFont {
  const subsets = readSubsets(file);
  const faces = subsets.map(({ fileName, range }) =>
    readFace({ fontsourcePackage: file.fontsourcePackage, fileName }, parseUnicodeRange(range)),
  );
  const runsOf = (text: string) => {
    const runs: { face: FontFace; text: string }[] = [];
    let previous: FontFace | undefined;
    for (const character of text.normalize('NFC')) {
      const face = faceOf(faces, character, previous);
      previous = face;
      if (!face) continue;
      const last = runs.at(-1);
      if (last?.face === face) last.text += character;
      else runs.push({ face, text: character });
    }
    return runs;
  };
  return {
    getPaths(text, x, y, fontSize) {
      let penX = x;
      return runsOf(text).flatMap((run) => {
        const paths = run.face.outlines.getPaths(run.text, penX, y, fontSize);
        penX += run.face.advance(run.text, fontSize);
        return paths;
      });
    },
    missingCharacters(text) {
      const missing = new Set<string>();
      let previous: FontFace | undefined;
      for (const character of text.normalize('NFC')) {
        previous = faceOf(faces, character, previous);
        if (!previous) missing.add(character);
      }
      return [...missing];
    },
  };
}

/**
 * The subset files of a shipped font beside the named one (same weight and style), in the order a browser tries
 * them, with their ranges from the package's unicode.json; just the named file when the package has no such list.
 */
function readSubsets(file: LetteringFontFile): { fileName: string; range: string }[] {
  const family = file.fontsourcePackage.slice('@fontsource/'.length);
  let ranges: Record<string, string>;
  try {
    ranges = JSON.parse(readFileSync(requireFromHere.resolve(`${file.fontsourcePackage}/unicode.json`), 'utf8'));
  } catch {
    return [{ fileName: file.fileName, range: 'U+0000-10FFFF' }];
  }
  const named = Object.keys(ranges).find((subset) => file.fileName.startsWith(`${family}-${subset}-`));
  if (!named) return [{ fileName: file.fileName, range: 'U+0000-10FFFF' }];
  const variant = file.fileName.slice(`${family}-${named}-`.length);
  return Object.entries(ranges)
    .reverse()
    .map(([subset, range]) => ({ fileName: `${family}-${subset}-${variant}`, range }))
    .filter(({ fileName }) => fontFileExists({ fontsourcePackage: file.fontsourcePackage, fileName }));
}

function fontFileExists(file: LetteringFontFile): boolean {
  try {
    return existsSync(requireFromHere.resolve(`${file.fontsourcePackage}/files/${file.fileName}`));
  } catch {
    return false;
  }
}

/** A loader that parses each font file once per process: parsing a font takes far longer than estimating with it. */
export function createLetteringFontLoader(): LetteringFontLoader {
  const loaded = new Map<string, LetteringFont>();
  return (file) => {
    const key = `${file.fontsourcePackage}/${file.fileName}`;
    let font = loaded.get(key);
    if (!font) {
      font = loadLetteringFont(file);
      loaded.set(key, font);
    }
    return font;
  };
}
